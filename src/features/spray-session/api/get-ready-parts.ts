import { queryOptions, useQueries, useQuery } from '@tanstack/react-query';
import { readyListSchema, type ReadyPart } from '../../../../shared/schemas/ready';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys, type ReadyFilter } from './spray-session-keys';

export async function getReadyParts(filter: ReadyFilter, signal?: AbortSignal) {
  const { items } = await apiClient.get('/api/ready', readyListSchema, { query: filter, signal });
  return items;
}

/** Where each part stands in its finish system: coats done, the next step and its recoat window. */
export const readyPartsQueryOptions = (filter: ReadyFilter) =>
  queryOptions({ queryKey: spraySessionKeys.ready(filter), queryFn: ({ signal }) => getReadyParts(filter, signal), refetchInterval: 60_000 });

export function useReadyParts(filter: ReadyFilter | null) {
  return useQuery({ ...readyPartsQueryOptions(filter ?? { jobId: 0 }), enabled: filter !== null });
}

/** The readiness of every part of the jobs given, by part id, and whether some of it is still loading. */
export function useReadyByJobs(jobIds: number[]): { ready: Map<number, ReadyPart>; pending: boolean } {
  return useQueries({
    queries: jobIds.map((jobId) => readyPartsQueryOptions({ jobId })),
    combine: (results) => ({ ready: new Map(results.flatMap((r) => r.data ?? []).map((part) => [part.id, part])), pending: results.some((r) => r.isPending) }),
  });
}
