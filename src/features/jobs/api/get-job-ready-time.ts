import { queryOptions, useQuery } from '@tanstack/react-query';
import { readyListSchema, type ReadyJob } from '../../../../shared/schemas/ready';
import { apiClient } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

/** When the whole job will be ready to handle and to pack, from the ready board's answer for the job. */
export async function getJobReadyTime(jobId: number, signal?: AbortSignal): Promise<ReadyJob | null> {
  const { jobs } = await apiClient.get('/api/ready', readyListSchema, { query: { jobId, collectedDays: 0 }, signal });
  return jobs.find((job) => job.jobId === jobId) ?? null;
}

export const jobReadyTimeQueryOptions = (jobId: number) =>
  queryOptions({ queryKey: jobKeys.readyTime(jobId), queryFn: ({ signal }) => getJobReadyTime(jobId, signal), refetchInterval: 60_000 });

export function useJobReadyTime(jobId: number) {
  return useQuery(jobReadyTimeQueryOptions(jobId));
}
