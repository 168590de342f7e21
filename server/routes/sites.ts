import { pageQuerySchema } from '../../shared/schemas/common';
import { createSiteSchema, siteSchema, updateSiteSchema } from '../../shared/schemas/site';
import { crudRoutes } from '../registry/crud-routes';
import type { ApiRoute } from '../registry/route';

/** Site names are the group's: every user reads them; only an admin adds or renames one. */
export const siteRoutes: ApiRoute[] = crudRoutes({
  path: '/api/sites',
  resource: 'site',
  noun: 'site',
  read: 'sites:read',
  write: 'sites:write',
  sites: 'group',
  listQuery: pageQuerySchema,
  createSchema: createSiteSchema,
  updateSchema: updateSiteSchema,
  itemSchema: siteSchema,
  service: (services) => services.sites,
});
