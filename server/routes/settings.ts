import { shopSettingsResponseSchema, updateShopSettingsSchema } from '../../shared/schemas/settings';
import { defineRoute, type ApiRoute } from '../registry/route';

/** The shop's settings are the group's (one timezone and one set of planning defaults). */
export const settingsRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/settings',
    summary: 'Shop settings',
    access: 'settings:read',
    sites: 'group',
    response: { status: 200, schema: shopSettingsResponseSchema },
    handler: async (_input, { services }) => ({ settings: await services.settings.get() }),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/settings',
    summary: 'Change shop settings',
    access: 'settings:write',
    sites: 'group',
    body: updateShopSettingsSchema,
    response: { status: 200, schema: shopSettingsResponseSchema },
    handler: async ({ body }, { services, actor }) => ({ settings: await services.settings.update(body, actor) }),
  }),
];
