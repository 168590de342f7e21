import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema, type PageQuery } from '../../../../shared/schemas/common';
import { finishSystemSchema } from '../../../../shared/schemas/finish-system';
import { apiClient } from '../../../lib/api-client';
import { finishSystemKeys } from './finish-system-keys';

const finishSystemListSchema = listSchema(finishSystemSchema);

export function getFinishSystems(filters: PageQuery, signal?: AbortSignal) {
  return apiClient.get('/api/finish-systems', finishSystemListSchema, { query: filters, signal });
}

export const finishSystemsQueryOptions = (filters: PageQuery) =>
  queryOptions({
    queryKey: finishSystemKeys.list(filters),
    queryFn: ({ signal }) => getFinishSystems(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useFinishSystems(filters: PageQuery) {
  return useQuery(finishSystemsQueryOptions(filters));
}
