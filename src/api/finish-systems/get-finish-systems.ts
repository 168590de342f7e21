import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { PageQuery } from '../../../shared/schemas/common';
import { finishSystemListSchema } from '../../../shared/schemas/finish-system';
import { apiClient } from '../../lib/api-client';
import { finishSystemKeys } from './finish-system-keys';

/** Every finish system in one page: a shop has a handful, never hundreds. */
const everyFinishSystem: PageQuery = { page: 1, pageSize: 200 };

export function getFinishSystems(filters: PageQuery, signal?: AbortSignal) {
  return apiClient.get('/api/finish-systems', finishSystemListSchema, { query: filters, signal });
}

export const finishSystemsQueryOptions = (filters: PageQuery = everyFinishSystem) =>
  queryOptions({
    queryKey: finishSystemKeys.list(filters),
    queryFn: ({ signal }) => getFinishSystems(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useFinishSystems(
  filters: PageQuery = everyFinishSystem,
  { enabled = true }: { enabled?: boolean } = {},
) {
  return useQuery({ ...finishSystemsQueryOptions(filters), enabled });
}
