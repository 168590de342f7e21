import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { boothListSchema } from '../../../shared/schemas/booth';
import { apiClient } from '../../lib/api-client';
import { boothKeys, type BoothFilters } from './booth-keys';

export function getBooths(filters: BoothFilters, signal?: AbortSignal) {
  return apiClient.get('/api/booths', boothListSchema, { query: filters, signal });
}

export const boothsQueryOptions = (filters: BoothFilters) =>
  queryOptions({
    queryKey: boothKeys.list(filters),
    queryFn: ({ signal }) => getBooths(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useBooths(filters: BoothFilters) {
  return useQuery(boothsQueryOptions(filters));
}
