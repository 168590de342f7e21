import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { coatSchema, type Coat } from '../../../../shared/schemas/coat';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { coatLogKeys, type CoatLogQuery } from './coat-log-keys';

const coatListSchema = listSchema(coatSchema);

export function getCoats(query: CoatLogQuery, signal?: AbortSignal) {
  return apiClient.get('/api/coats', coatListSchema, { query: { ...query, history: String(query.history) }, signal });
}

export const coatsQueryOptions = (query: CoatLogQuery) =>
  queryOptions({ queryKey: coatLogKeys.list(query), queryFn: ({ signal }) => getCoats(query, signal), placeholderData: keepPreviousData });

export function useCoats(query: CoatLogQuery) {
  return useQuery(coatsQueryOptions(query));
}

const exportPageSize = 500;

/** Every coat of the filter, page by page at the largest size the server allows, for the CSV. */
export async function getAllCoats(query: Omit<CoatLogQuery, 'page' | 'pageSize'>): Promise<Coat[]> {
  const coats: Coat[] = [];
  for (let page = 1; ; page += 1) {
    const result = await getCoats({ ...query, page, pageSize: exportPageSize });
    coats.push(...result.items);
    if (result.items.length === 0 || coats.length >= result.total) return coats;
  }
}
