import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { boothUpkeepSchema } from '../../../../shared/schemas/upkeep';
import { apiClient } from '../../../lib/api-client';
import { upkeepKeys } from './upkeep-keys';

const responseSchema = z.object({ upkeep: boothUpkeepSchema });

export async function getBoothUpkeep(boothId: number, signal?: AbortSignal) {
  return (await apiClient.get(`/api/booths/${boothId}/upkeep`, responseSchema, { signal })).upkeep;
}

export const boothUpkeepQueryOptions = (boothId: number) => queryOptions({ queryKey: upkeepKeys.booth(boothId), queryFn: ({ signal }) => getBoothUpkeep(boothId, signal) });

export function useBoothUpkeep(boothId: number) {
  return useQuery(boothUpkeepQueryOptions(boothId));
}
