import { queryOptions, useQuery } from '@tanstack/react-query';
import { mixListSchema } from '../../../shared/schemas/checklist';
import { apiClient } from '../../lib/api-client';
import { mixKeys } from './mix-keys';

export async function getMixes(spraySessionId: number, signal?: AbortSignal) {
  const { items } = await apiClient.get(`/api/spray-sessions/${spraySessionId}/mixes`, mixListSchema, { signal });
  return items;
}

/** The pots mixed for a spray session, newest first. */
export const mixesQueryOptions = (spraySessionId: number) =>
  queryOptions({ queryKey: mixKeys.list(spraySessionId), queryFn: ({ signal }) => getMixes(spraySessionId, signal) });

export function useMixes(spraySessionId: number) {
  return useQuery(mixesQueryOptions(spraySessionId));
}
