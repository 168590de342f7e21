import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { readySummaryResponseSchema } from '../../../shared/schemas/ready';
import { apiClient } from '../../lib/api-client';
import { livePollMs } from '../../lib/use-live-updates';
import { readyKeys, type ReadySummaryFilters } from './ready-keys';

/** The board in brief for a wall screen: job cards, the waiting line and the next parts to be ready, never every part. */
export function getReadySummary(filters: ReadySummaryFilters, signal?: AbortSignal) {
  return apiClient.get('/api/ready/summary', readySummaryResponseSchema, { query: { ...filters }, signal });
}

/**
 * Live events refresh it at once, and the screen asks again at the answer's `nextChangeAt`. The
 * slow poll covers a clock that runs apart from the server's; after a failure it polls faster.
 */
export const readySummaryQueryOptions = (filters: ReadySummaryFilters) =>
  queryOptions({
    queryKey: readyKeys.summary(filters),
    queryFn: ({ signal }) => getReadySummary(filters, signal),
    placeholderData: keepPreviousData,
    staleTime: 10_000,
    refetchInterval: (q) => (q.state.status === 'error' ? livePollMs : 60_000),
  });

/** A wall screen is often an unfocused window: it keeps polling in the background. */
export function useReadySummary(filters: ReadySummaryFilters) {
  return useQuery({ ...readySummaryQueryOptions(filters), refetchIntervalInBackground: true });
}
