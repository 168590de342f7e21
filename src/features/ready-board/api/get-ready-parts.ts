import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { readyListSchema } from '../../../../shared/schemas/ready';
import { apiClient } from '../../../lib/api-client';
import { livePollMs } from '../../../lib/use-live-updates';
import { readyKeys, type ReadyQuery } from './ready-keys';

/** The parts and, for each of their jobs, when the whole job is ready to handle and to pack. */
export function getReadyParts(query: ReadyQuery, signal?: AbortSignal) {
  return apiClient.get('/api/ready', readyListSchema, { query: { ...query }, signal });
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
