import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { jobSchema, type JobListQuery } from '../../../../shared/schemas/job';
import { apiClient } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

const jobListSchema = listSchema(jobSchema);

export function getJobs(filters: JobListQuery, signal?: AbortSignal) {
  return apiClient.get('/api/jobs', jobListSchema, { query: filters, signal });
}

export const jobsQueryOptions = (filters: JobListQuery) =>
  queryOptions({
    queryKey: jobKeys.list(filters),
    queryFn: ({ signal }) => getJobs(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useJobs(filters: JobListQuery) {
  return useQuery(jobsQueryOptions(filters));
}
