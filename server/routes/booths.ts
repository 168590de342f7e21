import { z } from 'zod';
import { boothSchema, createBoothSchema, updateBoothSchema } from '../../shared/schemas/booth';
import { idParamsSchema, pageFields } from '../../shared/schemas/common';
import { siteFilterFields } from '../../shared/schemas/site';
import { crudRoutes } from '../registry/crud-routes';
import { defineRoute, type ApiRoute } from '../registry/route';

export const boothRoutes: ApiRoute[] = [
  ...crudRoutes({
    path: '/api/booths',
    resource: 'booth',
    noun: 'booth',
    read: 'booths:read',
    write: 'booths:write',
    sites: 'site',
    listQuery: z.object({ ...pageFields(50, 200), ...siteFilterFields }),
    createSchema: createBoothSchema,
    updateSchema: updateBoothSchema,
    itemSchema: boothSchema,
    service: (services) => services.booths,
  }),
  defineRoute({
    method: 'post',
    path: '/api/booths/:id/sensor-token',
    summary: 'Issue a new bearer token for the booth’s sensor (shown once; the old one stops working)',
    access: 'booths:write',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 201, schema: z.object({ token: z.string() }) },
    handler: async ({ params }, { services, actor }) => ({ token: await services.readings.issueSensorToken(params.id, actor) }),
  }),
];
