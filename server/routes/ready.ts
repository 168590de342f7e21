import { readyListSchema, readyQuerySchema } from '../../shared/schemas/ready';
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
];
