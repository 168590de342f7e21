import { queryOptions, useQuery } from '@tanstack/react-query';
import { partResponseSchema } from '../../../shared/schemas/part';
import { apiClient } from '../../lib/api-client';
import { partKeys } from './part-keys';

export async function getPart(id: number, signal?: AbortSignal) {
  const { part } = await apiClient.get(`/api/parts/${id}`, partResponseSchema, { signal });
  return part;
}

export const partQueryOptions = (id: number) =>
  queryOptions({ queryKey: partKeys.detail(id), queryFn: ({ signal }) => getPart(id, signal) });

export function usePart(id: number) {
  return useQuery(partQueryOptions(id));
}
