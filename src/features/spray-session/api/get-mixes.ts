import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { mixSchema } from '../../../../shared/schemas/checklist';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const mixListSchema = z.object({ items: z.array(mixSchema) });

export async function getMixes(sessionId: number, signal?: AbortSignal) {
  const { items } = await apiClient.get(`/api/spray-sessions/${sessionId}/mixes`, mixListSchema, { signal });
  return items;
}

/** Newest first, as the server lists them. */
export const mixesQueryOptions = (sessionId: number) =>
  queryOptions({ queryKey: spraySessionKeys.mixes(sessionId), queryFn: ({ signal }) => getMixes(sessionId, signal) });

export function useMixes(sessionId: number) {
  return useQuery(mixesQueryOptions(sessionId));
}
