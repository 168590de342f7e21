import {
  createCrewRecordSchema,
  crewDetailResponseSchema,
  crewRecordResponseSchema,
  crewStatusListSchema,
  crewStatusQuerySchema,
  crewUserParamsSchema,
} from '../../shared/schemas/crew';
import { defineRoute, type ApiRoute } from '../registry/route';

/** Crew protection records belong to the person's site; details to the person and the admin, status to a lead. */
export const crewRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/crew',
    summary:
      'Each sprayer’s and lead’s fit test, health surveillance and training as a status only (valid, due soon, lapsed, none)',
    access: 'crew:status',
    sites: 'site',
    query: crewStatusQuerySchema,
    response: { status: 200, schema: crewStatusListSchema },
    handler: async (_input, { services }) => ({ items: await services.crew.statuses() }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/crew/:userId',
    summary: 'One person’s crew protection records in full: the person themself, or the admin',
    access: 'crew:own',
    sites: 'site',
    params: crewUserParamsSchema,
    response: { status: 200, schema: crewDetailResponseSchema },
    handler: async ({ params }, { services, user }) => ({ crew: await services.crew.detail(params.userId, user!) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/crew/:userId/records',
    summary: 'Record a face-fit test, health surveillance or training for a person (admin)',
    access: 'crew:write',
    sites: 'site',
    params: crewUserParamsSchema,
    body: createCrewRecordSchema,
    response: { status: 201, schema: crewRecordResponseSchema },
    handler: async ({ params, body }, { services, actor }) => ({
      record: await services.crew.record(params.userId, body, actor),
    }),
  }),
];
