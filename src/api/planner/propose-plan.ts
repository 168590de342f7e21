import { useMutation } from '@tanstack/react-query';
import { planResponseSchema, type PlanRequest } from '../../../shared/schemas/planner';
import { apiRequest } from '../../lib/api-client';

/** A proposal only: the server books nothing until the plan is accepted. An admin may keep it to one site's booths. */
export async function proposePlan(request: PlanRequest, siteId?: number) {
  const { plan } = await apiRequest('POST', '/api/planner/proposals', planResponseSchema, {
    body: request,
    query: { siteId },
  });
  return plan;
}

export function useProposePlan(siteId?: number) {
  return useMutation({ mutationFn: (request: PlanRequest) => proposePlan(request, siteId) });
}
