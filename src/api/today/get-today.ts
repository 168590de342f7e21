import { queryOptions, useQuery } from '@tanstack/react-query';
import { todayResponseSchema } from '../../../shared/schemas/today';
import { apiClient } from '../../lib/api-client';
import { todayKeys } from './today-keys';

export async function getToday(siteId: number | undefined, signal?: AbortSignal) {
  const { today } = await apiClient.get('/api/today', todayResponseSchema, { query: { siteId }, signal });
  return today;
}

/** The board follows live changes; the minute poll moves countdowns and "closing today" along on a quiet stream. */
export const todayQueryOptions = (siteId?: number) =>
  queryOptions({
    queryKey: todayKeys.board(siteId),
    queryFn: ({ signal }) => getToday(siteId, signal),
    refetchInterval: 60_000,
  });

export function useToday(siteId?: number) {
  return useQuery(todayQueryOptions(siteId));
}
