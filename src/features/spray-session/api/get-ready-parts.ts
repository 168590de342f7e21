import { queryOptions, useQueries, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { readyPartSchema, type ReadyPart } from '../../../../shared/schemas/ready';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys, type ReadyFilter } from './spray-session-keys';

const readyListSchema = z.object({ items: z.array(readyPartSchema) });

export async function getReadyParts(filter: ReadyFilter, signal?: AbortSignal) {
  const { items } = await apiClient.get('/api/ready', readyListSchema, { query: filter, signal });
  return items;
}

/** Where each part stands in its finish system: coats done, the next step and its recoat window. */
export const readyPartsQueryOptions = (filter: ReadyFilter) =>
  queryOptions({ queryKey: spraySessionKeys.ready(filter), queryFn: ({ signal }) => getReadyParts(filter, signal), refetchInterval: 60_000 });

export function useReadyParts(filter: ReadyFilter | null) {
  return useQuery({ ...readyPartsQueryOptions(filter ?? { jobId: 0 }), enabled: filter !== null });
}

/** The readiness of every part of the jobs given, by part id. */
export function useReadyByJobs(jobIds: number[]): Map<number, ReadyPart> {
  return useQueries({
    queries: jobIds.map((jobId) => readyPartsQueryOptions({ jobId })),
    combine: (results) => new Map(results.flatMap((r) => r.data ?? []).map((part) => [part.id, part])),
  });
}
