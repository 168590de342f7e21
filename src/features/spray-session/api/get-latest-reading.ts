import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { readingSchema } from '../../../../shared/schemas/reading';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const readingListSchema = listSchema(readingSchema);

export async function getLatestReading(boothId: number, signal?: AbortSignal) {
  const { items } = await apiClient.get('/api/readings', readingListSchema, { query: { boothId, pageSize: 1 }, signal });
  return items[0] ?? null;
}

/** The booth's last typed or sensor reading, to prefill the conditions so the sprayer only corrects them. */
export const latestReadingQueryOptions = (boothId: number) =>
  queryOptions({ queryKey: spraySessionKeys.latestReading(boothId), queryFn: ({ signal }) => getLatestReading(boothId, signal) });

export function useLatestReading(boothId: number) {
  return useQuery(latestReadingQueryOptions(boothId));
}
