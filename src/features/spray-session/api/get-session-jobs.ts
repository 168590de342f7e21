import { queryOptions, useQueries, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { listSchema } from '../../../../shared/schemas/common';
import { jobSchema, type Job } from '../../../../shared/schemas/job';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const jobResponseSchema = z.object({ job: jobSchema });
const jobListSchema = listSchema(jobSchema);

export async function getSessionJob(id: number, signal?: AbortSignal) {
  const { job } = await apiClient.get(`/api/jobs/${id}`, jobResponseSchema, { signal });
  return job;
}

export const sessionJobQueryOptions = (id: number) =>
  queryOptions({ queryKey: spraySessionKeys.job(id), queryFn: ({ signal }) => getSessionJob(id, signal), staleTime: 60_000 });

/** Each job's finish system tells which product a step sprays. */
export function useSessionJobs(ids: number[]): { jobs: Job[]; pending: boolean } {
  return useQueries({
    queries: ids.map((id) => sessionJobQueryOptions(id)),
    combine: (results) => ({ jobs: results.flatMap((r) => (r.data ? [r.data] : [])), pending: results.some((r) => r.isPending) }),
  });
}

export function getOpenJobs(signal?: AbortSignal) {
  return apiClient.get('/api/jobs', jobListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

/** For choosing parts by job: the open job book, newest first as the server lists it. */
export const openJobsQueryOptions = () =>
  queryOptions({ queryKey: spraySessionKeys.jobs(), queryFn: ({ signal }) => getOpenJobs(signal), staleTime: 60_000 });

export function useOpenJobs(enabled: boolean) {
  return useQuery({ ...openJobsQueryOptions(), enabled });
}
