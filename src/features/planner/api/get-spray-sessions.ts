import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { listSchema } from '../../../../shared/schemas/common';
import { spraySessionSchema } from '../../../../shared/schemas/spray-session';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys, type SessionRange } from './planner-keys';

/** The fields the planner shows; the run-time fields (checklist, clearing) belong to the spray session page. */
export const plannerSessionSchema = spraySessionSchema.pick({
  id: true,
  boothId: true,
  boothName: true,
  start: true,
  end: true,
  sprayerId: true,
  sprayerName: true,
  state: true,
  notes: true,
  items: true,
  overrideReason: true,
  work: true,
});
export type PlannerSession = z.infer<typeof plannerSessionSchema>;

const sessionListSchema = listSchema(plannerSessionSchema);

export function getSpraySessions(range: SessionRange, signal?: AbortSignal) {
  return apiClient.get('/api/spray-sessions', sessionListSchema, { query: { ...range, pageSize: 1000 }, signal });
}

/** Until the push channel comes, the plan is kept fresh by polling and on returning to the window. */
export const spraySessionsQueryOptions = (range: SessionRange, live = true) =>
  queryOptions({
    queryKey: plannerKeys.sessionList(range),
    queryFn: ({ signal }) => getSpraySessions(range, signal),
    placeholderData: keepPreviousData,
    refetchInterval: live ? 30_000 : false,
    refetchOnWindowFocus: live,
  });

export function useSpraySessions(range: SessionRange, live = true) {
  return useQuery(spraySessionsQueryOptions(range, live));
}
