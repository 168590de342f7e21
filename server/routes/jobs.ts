import { idParamsSchema } from '../../shared/schemas/common';
import { createJobSchema, estimateQuerySchema, estimateResponseSchema, jobListQuerySchema, jobListSchema, jobResponseSchema, updateJobSchema } from '../../shared/schemas/job';
import { defineRoute, type ApiRoute } from '../registry/route';

/** Jobs are the group's work orders: every site reads the same job book. */
export const jobRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/jobs',
    summary: 'List jobs by due date (?q searches customer and reference; ?state: a state, "active" for not delivered or cancelled, or the old "finished" for delivered)',
    access: 'jobs:read',
    sites: 'group',
    query: jobListQuerySchema,
    response: { status: 200, schema: jobListSchema },
    // An in-finish job shows as ready once its ready time has passed.
    cache: { clearedBy: 'any', clock: true },
    handler: ({ query }, { services }) => services.jobs.list(query),
  }),
  defineRoute({
    method: 'post',
    path: '/api/jobs',
    summary: 'Add a job',
    access: 'jobs:write',
    sites: 'group',
    body: createJobSchema,
    response: { status: 201, schema: jobResponseSchema },
    handler: async ({ body }, { services, actor }) => ({ job: await services.jobs.create(body, actor) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id',
    summary: 'One job',
    access: 'jobs:read',
    sites: 'group',
    params: idParamsSchema,
    response: { status: 200, schema: jobResponseSchema },
    handler: async ({ params }, { services }) => ({ job: await services.jobs.get(params.id) }),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/jobs/:id',
    summary: 'Change a job; a state set here is recorded as set by a lead (the old value "finished" is read as "delivered")',
    access: 'jobs:write',
    sites: 'group',
    params: idParamsSchema,
    body: updateJobSchema,
    response: { status: 200, schema: jobResponseSchema },
    handler: async ({ params, body }, { services, actor }) => ({ job: await services.jobs.update(params.id, body, actor) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id/estimate',
    summary: 'Material estimate for the whole job (?method, ?transferEfficiencyPct)',
    access: 'jobs:read',
    sites: 'group',
    params: idParamsSchema,
    query: estimateQuerySchema,
    response: { status: 200, schema: estimateResponseSchema },
    handler: async ({ params, query }, { services }) => ({ estimate: await services.estimates.forJob(params.id, query) }),
  }),
];
