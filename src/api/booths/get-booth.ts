import { queryOptions, useQuery } from '@tanstack/react-query';
import { boothResponseSchema } from '../../../shared/schemas/booth';
import { apiClient } from '../../lib/api-client';
import { boothKeys } from './booth-keys';

export async function getBooth(id: number, signal?: AbortSignal) {
  const { booth } = await apiClient.get(`/api/booths/${id}`, boothResponseSchema, { signal });
  return booth;
}

export const boothQueryOptions = (id: number) =>
  queryOptions({ queryKey: boothKeys.detail(id), queryFn: ({ signal }) => getBooth(id, signal) });

export function useBooth(id: number) {
  return useQuery(boothQueryOptions(id));
}
