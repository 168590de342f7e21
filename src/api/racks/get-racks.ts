import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { rackListSchema } from '../../../shared/schemas/rack';
import { apiClient } from '../../lib/api-client';
import { rackKeys, type RackFilters } from './rack-keys';

export function getRacks(filters: RackFilters, signal?: AbortSignal) {
  return apiClient.get('/api/racks', rackListSchema, { query: filters, signal });
}

export const racksQueryOptions = (filters: RackFilters) =>
  queryOptions({
    queryKey: rackKeys.list(filters),
    queryFn: ({ signal }) => getRacks(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useRacks(filters: RackFilters) {
  return useQuery(racksQueryOptions(filters));
}
