import { queryOptions, useQuery } from '@tanstack/react-query';
import { rackResponseSchema } from '../../../shared/schemas/rack';
import { apiClient } from '../../lib/api-client';
import { rackKeys } from './rack-keys';

export async function getRack(id: number, signal?: AbortSignal) {
  const { rack } = await apiClient.get(`/api/racks/${id}`, rackResponseSchema, { signal });
  return rack;
}

export const rackQueryOptions = (id: number) => queryOptions({ queryKey: rackKeys.detail(id), queryFn: ({ signal }) => getRack(id, signal) });

export function useRack(id: number) {
  return useQuery(rackQueryOptions(id));
}
