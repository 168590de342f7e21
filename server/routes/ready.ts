import { z } from 'zod';
import { readyPartSchema, readyQuerySchema } from '../../shared/schemas/ready';
import { defineRoute, type ApiRoute } from '../registry/route';

export const readyRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/ready',
    summary: 'Part readiness: parts on the caller’s site’s racks, last coated there, or not yet begun (?jobId, ?rackId)',
    access: 'ready:read',
    sites: 'site',
    query: readyQuerySchema,
    response: { status: 200, schema: z.object({ items: z.array(readyPartSchema) }) },
    handler: async ({ query }, { services }) => ({ items: await services.ready.list(query) }),
  }),
];
