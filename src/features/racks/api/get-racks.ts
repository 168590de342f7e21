import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { rackSchema } from '../../../../shared/schemas/rack';
import { apiClient } from '../../../lib/api-client';
import { rackKeys, type RackListFilters } from './rack-keys';

const rackListSchema = listSchema(rackSchema);

export function getRacks(filters: RackListFilters, signal?: AbortSignal) {
  return apiClient.get('/api/racks', rackListSchema, { query: filters, signal });
}

export const racksQueryOptions = (filters: RackListFilters) =>
  queryOptions({
    queryKey: rackKeys.list(filters),
    queryFn: ({ signal }) => getRacks(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useRacks(filters: RackListFilters) {
  return useQuery(racksQueryOptions(filters));
}
