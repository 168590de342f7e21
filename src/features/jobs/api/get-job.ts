import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { jobSchema } from '../../../../shared/schemas/job';
import { apiClient } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

export const jobResponseSchema = z.object({ job: jobSchema });

export async function getJob(id: number, signal?: AbortSignal) {
  const { job } = await apiClient.get(`/api/jobs/${id}`, jobResponseSchema, { signal });
  return job;
}

export const jobQueryOptions = (id: number) => queryOptions({ queryKey: jobKeys.detail(id), queryFn: ({ signal }) => getJob(id, signal) });

export function useJob(id: number) {
  return useQuery(jobQueryOptions(id));
}
