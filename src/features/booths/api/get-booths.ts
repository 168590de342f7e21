import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { boothSchema } from '../../../../shared/schemas/booth';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { boothKeys, type BoothListFilters } from './booth-keys';

const boothListSchema = listSchema(boothSchema);

export function getBooths(filters: BoothListFilters, signal?: AbortSignal) {
  return apiClient.get('/api/booths', boothListSchema, { query: filters, signal });
}

export const boothsQueryOptions = (filters: BoothListFilters) =>
  queryOptions({
    queryKey: boothKeys.list(filters),
    queryFn: ({ signal }) => getBooths(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useBooths(filters: BoothListFilters) {
  return useQuery(boothsQueryOptions(filters));
}
