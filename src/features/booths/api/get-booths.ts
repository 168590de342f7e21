import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { boothSchema } from '../../../../shared/schemas/booth';
import { listSchema, type PageQuery } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { boothKeys } from './booth-keys';

const boothListSchema = listSchema(boothSchema);

export function getBooths(filters: PageQuery, signal?: AbortSignal) {
  return apiClient.get('/api/booths', boothListSchema, { query: filters, signal });
}

export const boothsQueryOptions = (filters: PageQuery) =>
  queryOptions({
    queryKey: boothKeys.list(filters),
    queryFn: ({ signal }) => getBooths(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useBooths(filters: PageQuery) {
  return useQuery(boothsQueryOptions(filters));
}
