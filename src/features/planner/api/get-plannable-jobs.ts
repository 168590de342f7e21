import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { jobSchema } from '../../../../shared/schemas/job';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const jobListSchema = listSchema(jobSchema);

export function getPlannableJobs(signal?: AbortSignal) {
  return apiClient.get('/api/jobs', jobListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

/** Jobs still to be finished; finished and cancelled ones have nothing left to spray. */
export const plannableJobsQueryOptions = (enabled = true) =>
  queryOptions({
    queryKey: plannerKeys.jobs(),
    queryFn: ({ signal }) => getPlannableJobs(signal),
    select: (list) => list.items.filter((job) => job.state === 'open' || job.state === 'in-finish'),
    enabled,
  });

export function usePlannableJobs(enabled = true) {
  return useQuery(plannableJobsQueryOptions(enabled));
}
