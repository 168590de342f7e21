import { z } from 'zod';
import { siteFilterFields } from '../../shared/schemas/site';
import { sprayerSchema } from '../../shared/schemas/spray-session';
import { defineRoute, type ApiRoute } from '../registry/route';

export const sprayerRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/sprayers',
    summary: 'Who can be given a spray session: active sprayers and leads of the caller’s site',
    access: 'spray-sessions:read',
    sites: 'site',
    query: z.object(siteFilterFields),
    response: { status: 200, schema: z.object({ items: z.array(sprayerSchema) }) },
    handler: async (_input, { services }) => ({ items: await services.sprayers.list() }),
  }),
];
