import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { planSchema, type PlanRequest } from '../../../../shared/schemas/planner';
import { apiRequest } from '../../../lib/api-client';

const proposalResponseSchema = z.object({ plan: planSchema });

/** A proposal only: the server books nothing until the plan is accepted. An admin may keep it to one site's booths. */
export async function proposePlan(request: PlanRequest, siteId?: number) {
  const { plan } = await apiRequest('POST', '/api/planner/proposals', proposalResponseSchema, { body: request, query: { siteId } });
  return plan;
}

export function useProposePlan(siteId?: number) {
  return useMutation({ mutationFn: (request: PlanRequest) => proposePlan(request, siteId) });
}
