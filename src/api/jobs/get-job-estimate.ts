import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { estimateResponseSchema } from '../../../shared/schemas/job';
import { apiClient } from '../../lib/api-client';
import { jobKeys, type EstimateFilters } from './job-keys';

export async function getJobEstimate(id: number, filters: EstimateFilters, signal?: AbortSignal) {
  const { estimate } = await apiClient.get(`/api/jobs/${id}/estimate`, estimateResponseSchema, {
    query: filters,
    signal,
  });
  return estimate;
}

export const jobEstimateQueryOptions = (id: number, filters: EstimateFilters) =>
  queryOptions({
    queryKey: jobKeys.estimate(id, filters),
    queryFn: ({ signal }) => getJobEstimate(id, filters, signal),
    placeholderData: keepPreviousData,
  });

export function useJobEstimate(id: number, filters: EstimateFilters) {
  return useQuery(jobEstimateQueryOptions(id, filters));
}
