import { queryOptions, useQueries, useQuery } from '@tanstack/react-query';
import { jobResponseSchema, type Job } from '../../../shared/schemas/job';
import { apiClient } from '../../lib/api-client';
import { jobKeys } from './job-keys';

export async function getJob(id: number, signal?: AbortSignal) {
  const { job } = await apiClient.get(`/api/jobs/${id}`, jobResponseSchema, { signal });
  return job;
}

export const jobQueryOptions = (id: number) =>
  queryOptions({ queryKey: jobKeys.detail(id), queryFn: ({ signal }) => getJob(id, signal) });

export function useJob(id: number) {
  return useQuery(jobQueryOptions(id));
}

/** A handful of jobs by id (the jobs of a spray session's parts), each from its own cached detail. */
export function useJobsById(ids: number[]): { jobs: Job[]; pending: boolean; error: unknown } {
  return useQueries({
    queries: ids.map((id) => jobQueryOptions(id)),
    combine: (results) => ({
      jobs: results.flatMap((r) => (r.data ? [r.data] : [])),
      pending: results.some((r) => r.isPending),
      error: results.find((r) => r.isError)?.error ?? null,
    }),
  });
}
