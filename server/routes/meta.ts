import { z } from 'zod';
import { defineRoute, type ApiRoute } from '../registry/route';

export const metaRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/health',
    summary: 'Liveness check',
    access: 'public',
    sites: 'own',
    bare: true,
    response: { status: 200, schema: z.object({ ok: z.literal(true) }) },
    handler: () => ({ ok: true }),
  }),
];
