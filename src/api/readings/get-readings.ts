import { queryOptions, useQuery } from '@tanstack/react-query';
import { readingListSchema } from '../../../shared/schemas/reading';
import { apiClient } from '../../lib/api-client';
import { readingKeys, type ReadingFilters } from './reading-keys';

export function getReadings(filters: ReadingFilters, signal?: AbortSignal) {
  return apiClient.get('/api/readings', readingListSchema, { query: { ...filters }, signal });
}

export const readingsQueryOptions = (filters: ReadingFilters) =>
  queryOptions({ queryKey: readingKeys.list(filters), queryFn: ({ signal }) => getReadings(filters, signal) });

/** The booth's last typed or sensor reading (null when it has none), to prefill the conditions so the sprayer only corrects them. */
export function useLatestReading(boothId: number) {
  return useQuery({ ...readingsQueryOptions({ boothId, pageSize: 1 }), select: (list) => list.items[0] ?? null });
}
