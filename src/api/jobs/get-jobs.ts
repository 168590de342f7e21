import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { jobListSchema } from '../../../shared/schemas/job';
import { apiClient } from '../../lib/api-client';
import { jobKeys, type JobFilters } from './job-keys';

export function getJobs(filters: JobFilters, signal?: AbortSignal) {
  return apiClient.get('/api/jobs', jobListSchema, { query: filters, signal });
}

/** By due date. */
export const jobsQueryOptions = (filters: JobFilters) =>
  queryOptions({
    queryKey: jobKeys.list(filters),
    queryFn: ({ signal }) => getJobs(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useJobs(filters: JobFilters, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...jobsQueryOptions(filters), enabled });
}
