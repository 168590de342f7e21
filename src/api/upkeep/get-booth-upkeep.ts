import { queryOptions, useQuery } from '@tanstack/react-query';
import { boothUpkeepResponseSchema } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { upkeepKeys } from './upkeep-keys';

export async function getBoothUpkeep(boothId: number, signal?: AbortSignal) {
  const { upkeep } = await apiClient.get(`/api/booths/${boothId}/upkeep`, boothUpkeepResponseSchema, { signal });
  return upkeep;
}

/** One booth's filter banks with their gauges, filter changes, extraction tests and fire inspections. */
export const boothUpkeepQueryOptions = (boothId: number) =>
  queryOptions({ queryKey: upkeepKeys.booth(boothId), queryFn: ({ signal }) => getBoothUpkeep(boothId, signal) });

export function useBoothUpkeep(boothId: number) {
  return useQuery(boothUpkeepQueryOptions(boothId));
}
