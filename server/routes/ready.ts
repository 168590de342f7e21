import { readyListSchema, readyQuerySchema, readySummaryQuerySchema, readySummaryResponseSchema } from '../../shared/schemas/ready';
import { defineRoute, type ApiRoute } from '../registry/route';

export const readyRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/ready',
    summary:
      'Part readiness with expected handle and pack times, and each job’s: parts on the caller’s site’s racks, last coated there, or not yet begun (?jobId, ?rackId, ?state, ?collectedDays)',
    access: 'ready:read',
    sites: 'site',
    query: readyQuerySchema,
    response: { status: 200, schema: readyListSchema },
    // Parts are seen from several sites, and their states change as drying time passes.
    cache: { clearedBy: 'any', clock: true },
    handler: ({ query }, { services }) => services.ready.list(query),
  }),
  defineRoute({
    method: 'get',
    path: '/api/ready/summary',
    summary:
      'The ready board in brief for a wall screen: jobs with parts to collect counted per state (busiest first, ?jobs= of them), jobs waiting for a first coat, the ?next= parts soonest ready to handle, and the next instant a count changes by itself',
    access: 'ready:read',
    sites: 'site',
    query: readySummaryQuerySchema,
    response: { status: 200, schema: readySummaryResponseSchema },
    // Counted at the server's clock: the answer carries each instant a count changes, and is kept until the first.
    cache: { clearedBy: 'any', clock: true },
    handler: async ({ query }, { services }) => ({ summary: await services.ready.summary(query) }),
  }),
];
