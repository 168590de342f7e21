import { queryOptions, useQuery } from '@tanstack/react-query';
import { sprayerListSchema } from '../../../shared/schemas/sprayer';
import { apiClient } from '../../lib/api-client';
import { sprayerKeys } from './sprayer-keys';

export function getSprayers(boothId: number, signal?: AbortSignal) {
  return apiClient.get('/api/sprayers', sprayerListSchema, { query: { boothId }, signal });
}

/** Who a session in this booth can be given to: the active sprayers and leads of the booth's site. */
export const sprayersQueryOptions = (boothId: number) =>
  queryOptions({
    queryKey: sprayerKeys.list(boothId),
    queryFn: ({ signal }) => getSprayers(boothId, signal),
    select: (list) => list.items,
    staleTime: 5 * 60_000,
  });

export function useSprayers(boothId: number | undefined) {
  const known = boothId !== undefined && Number.isFinite(boothId);
  return useQuery({ ...sprayersQueryOptions(known ? boothId : 0), enabled: known });
}
