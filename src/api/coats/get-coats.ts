import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { coatListSchema, type Coat } from '../../../shared/schemas/coat';
import { apiClient } from '../../lib/api-client';
import { coatKeys, type CoatFilters } from './coat-keys';

export function getCoats(filters: CoatFilters, signal?: AbortSignal) {
  return apiClient.get('/api/coats', coatListSchema, { query: filters, signal });
}

/** Newest first; current versions only unless `history` asks for every version. */
export const coatsQueryOptions = (filters: CoatFilters) =>
  queryOptions({
    queryKey: coatKeys.list(filters),
    queryFn: ({ signal }) => getCoats(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useCoats(filters: CoatFilters) {
  return useQuery(coatsQueryOptions(filters));
}

const exportPageSize = 500;

/** Every coat of the filter, page by page at the largest size the server allows (the coat log's CSV). */
export async function getAllCoats(filters: Omit<CoatFilters, 'page' | 'pageSize'>): Promise<Coat[]> {
  const coats: Coat[] = [];
  for (let page = 1; ; page += 1) {
    const result = await getCoats({ ...filters, page, pageSize: exportPageSize });
    coats.push(...result.items);
    if (result.items.length === 0 || coats.length >= result.total) return coats;
  }
}
