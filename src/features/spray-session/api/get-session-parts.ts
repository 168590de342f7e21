import { queryOptions, useQueries } from '@tanstack/react-query';
import { z } from 'zod';
import { partSchema, type Part } from '../../../../shared/schemas/part';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

export const partResponseSchema = z.object({ part: partSchema });

export async function getSessionPart(id: number, signal?: AbortSignal) {
  const { part } = await apiClient.get(`/api/parts/${id}`, partResponseSchema, { signal });
  return part;
}

export const sessionPartQueryOptions = (id: number) =>
  queryOptions({ queryKey: spraySessionKeys.part(id), queryFn: ({ signal }) => getSessionPart(id, signal), staleTime: 60_000 });

/** The planned parts, one call each: a session plans tens of parts, not thousands. */
export function useSessionParts(ids: number[]): { parts: Part[]; pending: boolean; error: unknown } {
  return useQueries({
    queries: ids.map((id) => sessionPartQueryOptions(id)),
    combine: (results) => ({
      parts: results.flatMap((r) => (r.data ? [r.data] : [])),
      pending: results.some((r) => r.isPending),
      error: results.find((r) => r.isError)?.error ?? null,
    }),
  });
}
