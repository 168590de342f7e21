import { queryOptions, useQuery } from '@tanstack/react-query';
import { sprayerListSchema } from '../../../../shared/schemas/sprayer';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

export function getSprayers(boothId: number, signal?: AbortSignal) {
  return apiClient.get('/api/sprayers', sprayerListSchema, { query: { boothId }, signal });
}

/** Who a session in this booth can be given to: the active sprayers and leads of the booth's site. */
export const sprayersQueryOptions = (boothId: number | undefined) =>
  queryOptions({
    queryKey: plannerKeys.sprayers(boothId),
    queryFn: ({ signal }) => getSprayers(boothId!, signal),
    select: (list) => list.items,
    staleTime: 5 * 60_000,
    enabled: boothId !== undefined && Number.isFinite(boothId),
  });

export function useSprayers(boothId: number | undefined) {
  return useQuery(sprayersQueryOptions(boothId));
}
