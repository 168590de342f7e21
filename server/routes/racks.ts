import { z } from 'zod';
import { pageFields } from '../../shared/schemas/common';
import { createRackSchema, rackSchema, updateRackSchema } from '../../shared/schemas/rack';
import { siteFilterFields } from '../../shared/schemas/site';
import { crudRoutes } from '../registry/crud-routes';
import type { ApiRoute } from '../registry/route';

export const rackRoutes: ApiRoute[] = crudRoutes({
  path: '/api/racks',
  resource: 'rack',
  noun: 'rack',
  read: 'racks:read',
  write: 'racks:write',
  sites: 'site',
  listQuery: z.object({ ...pageFields(50, 200), ...siteFilterFields }),
  createSchema: createRackSchema,
  updateSchema: updateRackSchema,
  itemSchema: rackSchema,
  service: (services) => services.racks,
});
