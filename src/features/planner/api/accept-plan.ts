import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlannedSession } from '../../../../shared/schemas/planner';
import { acceptPlanResponseSchema } from '../../../../shared/schemas/planner';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

/** Books every proposed session in one go; if one no longer fits, none is booked. */
export async function acceptPlan(sessions: PlannedSession[]) {
  const body = {
    sessions: sessions.map((s) => ({ boothId: s.boothId, start: s.start, end: s.end, items: s.partIds.map((partId) => ({ partId, stepPosition: s.stepPosition })) })),
  };
  return (await apiClient.post('/api/planner/accept', body, acceptPlanResponseSchema)).items;
}

export function useAcceptPlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptPlan,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: plannerKeys.sessions() }),
  });
}
