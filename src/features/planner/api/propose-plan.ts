import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { planSchema, type PlanRequest } from '../../../../shared/schemas/planner';
import { apiClient } from '../../../lib/api-client';

const proposalResponseSchema = z.object({ plan: planSchema });

/** A proposal only: the server books nothing until the plan is accepted. */
export async function proposePlan(request: PlanRequest) {
  const { plan } = await apiClient.post('/api/planner/proposals', request, proposalResponseSchema);
  return plan;
}

export function useProposePlan() {
  return useMutation({ mutationFn: proposePlan });
}
