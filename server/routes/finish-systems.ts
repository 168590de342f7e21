import { pageQuerySchema } from '../../shared/schemas/common';
import { createFinishSystemSchema, finishSystemSchema, updateFinishSystemSchema } from '../../shared/schemas/finish-system';
import { crudRoutes } from '../registry/crud-routes';
import type { ApiRoute } from '../registry/route';

export const finishSystemRoutes: ApiRoute[] = crudRoutes({
  path: '/api/finish-systems',
  resource: 'finishSystem',
  noun: 'finish system',
  read: 'finish-systems:read',
  write: 'finish-systems:write',
  sites: 'group',
  listQuery: pageQuerySchema,
  createSchema: createFinishSystemSchema,
  updateSchema: updateFinishSystemSchema,
  itemSchema: finishSystemSchema,
  service: (services) => services.finishSystems,
});
