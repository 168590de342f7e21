import { keepPreviousData, queryOptions, useQueries, useQuery } from '@tanstack/react-query';
import { readyListSchema, type ReadyJob, type ReadyPart } from '../../../shared/schemas/ready';
import { apiClient } from '../../lib/api-client';
import { livePollMs } from '../../lib/use-live-updates';
import { readyKeys, type ReadyFilters } from './ready-keys';

/** The parts and, for each of their jobs, when the whole job is ready to handle and to pack. */
export function getReady(filters: ReadyFilters, signal?: AbortSignal) {
  return apiClient.get('/api/ready', readyListSchema, { query: { ...filters }, signal });
}

/**
 * Live events refresh it at once. The slow poll covers what sends no event: a recoat window
 * closing on the server's clock. After a failure it polls faster, so a wall screen picks up
 * again soon after a server restart.
 */
export const readyQueryOptions = (filters: ReadyFilters) =>
  queryOptions({
    queryKey: readyKeys.list(filters),
    queryFn: ({ signal }) => getReady(filters, signal),
    placeholderData: keepPreviousData,
    staleTime: 10_000,
    refetchInterval: (q) => (q.state.status === 'error' ? livePollMs : 60_000),
  });

export function useReady(
  filters: ReadyFilters,
  { enabled = true, inBackground = false }: { enabled?: boolean; inBackground?: boolean } = {},
) {
  return useQuery({ ...readyQueryOptions(filters), enabled, refetchIntervalInBackground: inBackground });
}

/** When the whole job will be ready to handle and to pack (null when the board has nothing of it). */
export function useJobReadyTime(jobId: number) {
  return useQuery({
    ...readyQueryOptions({ jobId, collectedDays: 0 }),
    select: (list): ReadyJob | null => list.jobs.find((job) => job.jobId === jobId) ?? null,
  });
}

/** Where every part of the jobs given stands, by part id, and whether some of it is still loading. */
export function useReadyByJobs(jobIds: number[]): { ready: Map<number, ReadyPart>; pending: boolean } {
  return useQueries({
    queries: jobIds.map((jobId) => readyQueryOptions({ jobId })),
    combine: (results) => ({
      ready: new Map(results.flatMap((r) => r.data?.items ?? []).map((part) => [part.id, part])),
      pending: results.some((r) => r.isPending),
    }),
  });
}
