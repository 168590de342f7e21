import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { spraySessionListSchema } from '../../../shared/schemas/spray-session';
import { apiClient } from '../../lib/api-client';
import { spraySessionKeys, type SpraySessionFilters } from './spray-session-keys';

export function getSpraySessions(filters: SpraySessionFilters, signal?: AbortSignal) {
  return apiClient.get('/api/spray-sessions', spraySessionListSchema, {
    query: { pageSize: 1000, ...filters },
    signal,
  });
}

/** Kept current by live updates: a booking, a move or a sprayer starting a session refreshes it at once. */
export const spraySessionsQueryOptions = (filters: SpraySessionFilters) =>
  queryOptions({
    queryKey: spraySessionKeys.list(filters),
    queryFn: ({ signal }) => getSpraySessions(filters, signal),
    placeholderData: keepPreviousData,
  });

/** `enabled: false` holds the list as it is (while a session is being dragged, so the calendar does not redraw under the pointer). */
export function useSpraySessions(filters: SpraySessionFilters, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...spraySessionsQueryOptions(filters), enabled });
}
