import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { sessionResponseSchema } from './create-spray-session';
import type { PlannerSession } from './get-spray-sessions';
import { plannerKeys } from './planner-keys';

export async function getSpraySession(id: number, signal?: AbortSignal) {
  const { spraySession } = await apiClient.get(`/api/spray-sessions/${id}`, sessionResponseSchema, { signal });
  return spraySession;
}

/** The open summary stays live (a sprayer may start the session meanwhile); the calendar's copy shows at once. */
export const spraySessionQueryOptions = (id: number, shown?: PlannerSession) =>
  queryOptions({
    queryKey: plannerKeys.session(id),
    queryFn: ({ signal }) => getSpraySession(id, signal),
    placeholderData: shown,
    refetchInterval: 30_000,
  });

export function useSpraySession(id: number, shown?: PlannerSession) {
  return useQuery(spraySessionQueryOptions(id, shown));
}
