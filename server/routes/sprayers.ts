import { sprayerListSchema, sprayerQuerySchema } from '../../shared/schemas/sprayer';
import { defineRoute, type ApiRoute } from '../registry/route';

export const sprayerRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/sprayers',
    summary: 'Who can be given a spray session: active sprayers and leads of the caller’s site (?boothId: of that booth’s site; an admin ?siteId)',
    access: 'spray-sessions:read',
    sites: 'site',
    query: sprayerQuerySchema,
    response: { status: 200, schema: sprayerListSchema },
    handler: async ({ query }, { services }) => ({ items: await services.sprayers.list(query) }),
  }),
];
