import { queryOptions, useQuery } from '@tanstack/react-query';
import { maxPartIds, partListSchema, type Part } from '../../../shared/schemas/part';
import { apiClient } from '../../lib/api-client';
import { partKeys } from './part-keys';

/** Several parts in one call, by id; ids that name nothing are left out of the answer. */
export async function getParts(ids: number[], signal?: AbortSignal): Promise<Part[]> {
  if (ids.length === 0) return [];
  const { items } = await apiClient.get('/api/parts', partListSchema, { query: { ids: ids.join(',') }, signal });
  return items;
}

/** At most as many as the server answers at once; the caller says when a longer list was cut. */
export const partsQueryOptions = (ids: number[]) => {
  const wanted = [...new Set(ids)].sort((a, b) => a - b).slice(0, maxPartIds);
  return queryOptions({
    queryKey: partKeys.list({ ids: wanted }),
    queryFn: ({ signal }) => getParts(wanted, signal),
    enabled: wanted.length > 0,
  });
};

export function useParts(ids: number[]) {
  return useQuery(partsQueryOptions(ids));
}
