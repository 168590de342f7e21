import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema, type PageQuery } from '../../../../shared/schemas/common';
import { rackSchema } from '../../../../shared/schemas/rack';
import { apiClient } from '../../../lib/api-client';
import { rackKeys } from './rack-keys';

const rackListSchema = listSchema(rackSchema);

export function getRacks(filters: PageQuery, signal?: AbortSignal) {
  return apiClient.get('/api/racks', rackListSchema, { query: filters, signal });
}

export const racksQueryOptions = (filters: PageQuery) =>
  queryOptions({
    queryKey: rackKeys.list(filters),
    queryFn: ({ signal }) => getRacks(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useRacks(filters: PageQuery) {
  return useQuery(racksQueryOptions(filters));
}
