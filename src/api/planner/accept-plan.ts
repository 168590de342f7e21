import { useMutation, useQueryClient } from '@tanstack/react-query';
import { acceptPlanResponseSchema, type PlannedSession } from '../../../shared/schemas/planner';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/** Books every proposed session in one go; if one no longer fits, none is booked. */
export async function acceptPlan(sessions: PlannedSession[]) {
  const body = {
    sessions: sessions.map((s) => ({
      boothId: s.boothId,
      start: s.start,
      end: s.end,
      items: s.partIds.map((partId) => ({ partId, stepPosition: s.stepPosition })),
    })),
  };
  return (await apiClient.post('/api/planner/accept', body, acceptPlanResponseSchema)).items;
}

export function useAcceptPlan() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: acceptPlan, onSuccess: () => invalidate(queryClient, changedKeys.spraySession()) });
}
