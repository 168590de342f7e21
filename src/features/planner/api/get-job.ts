import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { jobSchema } from '../../../../shared/schemas/job';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const jobResponseSchema = z.object({ job: jobSchema });

export async function getJob(id: number, signal?: AbortSignal) {
  const { job } = await apiClient.get(`/api/jobs/${id}`, jobResponseSchema, { signal });
  return job;
}

/** Used with useQueries: a session's parts may come from several jobs. */
export const jobQueryOptions = (id: number) => queryOptions({ queryKey: plannerKeys.job(id), queryFn: ({ signal }) => getJob(id, signal), staleTime: 60_000 });
