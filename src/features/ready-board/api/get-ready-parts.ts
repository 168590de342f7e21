import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { readyPartSchema } from '../../../../shared/schemas/ready';
import { apiClient } from '../../../lib/api-client';
import { livePollMs } from '../../../lib/use-live-updates';
import { readyKeys, type ReadyQuery } from './ready-keys';

const readyListSchema = z.object({ items: z.array(readyPartSchema) });

export async function getReadyParts(query: ReadyQuery, signal?: AbortSignal) {
  const { items } = await apiClient.get('/api/ready', readyListSchema, { query: { ...query }, signal });
  return items;
}

/**
 * Live events refresh the board at once. The slow poll covers what sends no event: a part
 * collected elsewhere, a recoat window closing on the server's clock. After a failure it
 * polls faster, so a wall screen picks up again soon after a server restart.
 */
export const readyPartsQueryOptions = (query: ReadyQuery) =>
  queryOptions({
    queryKey: readyKeys.list(query),
    queryFn: ({ signal }) => getReadyParts(query, signal),
    placeholderData: keepPreviousData,
    staleTime: 10_000,
    refetchInterval: (q) => (q.state.status === 'error' ? livePollMs : 60_000),
  });

export function useReadyParts(query: ReadyQuery, options: { inBackground?: boolean } = {}) {
  return useQuery({ ...readyPartsQueryOptions(query), refetchIntervalInBackground: options.inBackground ?? false });
}
