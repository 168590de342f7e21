import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { spraySessionSchema } from '../../../../shared/schemas/spray-session';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

export const spraySessionResponseSchema = z.object({ spraySession: spraySessionSchema });

export async function getSpraySession(id: number, signal?: AbortSignal) {
  const { spraySession } = await apiClient.get(`/api/spray-sessions/${id}`, spraySessionResponseSchema, { signal });
  return spraySession;
}

/** Polled: the lead may change the plan or override a stop from another screen meanwhile. */
export const spraySessionQueryOptions = (id: number) =>
  queryOptions({ queryKey: spraySessionKeys.detail(id), queryFn: ({ signal }) => getSpraySession(id, signal), refetchInterval: 30_000 });

export function useSpraySession(id: number) {
  return useQuery(spraySessionQueryOptions(id));
}
