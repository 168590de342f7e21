import { z } from 'zod';
import { acceptPlanResponseSchema, acceptPlanSchema, planRequestSchema, planResponseSchema } from '../../shared/schemas/planner';
import { siteFilterFields } from '../../shared/schemas/site';
import { defineRoute, type ApiRoute } from '../registry/route';

export const plannerRoutes: ApiRoute[] = [
  defineRoute({
    method: 'post',
    path: '/api/planner/proposals',
    summary: 'Propose booth time for jobs’ remaining coats at the caller’s site (an admin ?siteId); books nothing',
    access: 'spray-sessions:write',
    sites: 'site',
    query: z.object(siteFilterFields),
    body: planRequestSchema,
    response: { status: 200, schema: planResponseSchema },
    handler: async ({ body }, { services }) => ({ plan: await services.planner.propose(body.jobIds, body.horizonDays) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/planner/accept',
    summary: 'Book every session of an accepted plan, or none of them',
    access: 'spray-sessions:write',
    sites: 'site',
    body: acceptPlanSchema,
    response: { status: 201, schema: acceptPlanResponseSchema },
    handler: async ({ body }, { services, actor }) => ({ items: await services.spraySessions.createAll(body.sessions, actor) }),
  }),
];
