import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { denibListSchema } from '../../../shared/schemas/denib';
import { apiClient } from '../../lib/api-client';
import { denibKeys, type DenibFilters } from './denib-keys';

export function getDenibs(filters: DenibFilters, signal?: AbortSignal) {
  return apiClient.get('/api/denibs', denibListSchema, { query: filters, signal });
}

/** Newest first. */
export const denibsQueryOptions = (filters: DenibFilters) =>
  queryOptions({
    queryKey: denibKeys.list(filters),
    queryFn: ({ signal }) => getDenibs(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useDenibs(filters: DenibFilters) {
  return useQuery(denibsQueryOptions(filters));
}
