import { createReadingSchema, readingListSchema, readingQuerySchema, readingResponseSchema } from '../../shared/schemas/reading';
import { defineRoute, type ApiRoute } from '../registry/route';

/** Conditions in a site's booths and at its racks are that site's. */
export const readingRoutes: ApiRoute[] = [
  defineRoute({
    method: 'post',
    path: '/api/readings',
    summary: 'Record conditions (signed in, or a booth sensor with Authorization: Bearer <token> for its own booth)',
    access: { sensorOr: 'readings:write' },
    sites: 'site',
    body: createReadingSchema,
    response: { status: 201, schema: readingResponseSchema },
    handler: async ({ body }, { services, sensor, user }) => {
      const source = sensor ? { userId: null, sensorBoothId: sensor.boothId } : { userId: user!.id };
      return { reading: await services.readings.record(body, source) };
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/readings',
    summary: 'Readings, newest first (?boothId, ?rackId)',
    access: 'booths:read',
    sites: 'site',
    query: readingQuerySchema,
    response: { status: 200, schema: readingListSchema },
    handler: ({ query }, { services }) => services.readings.list(query),
  }),
];
