import { coatCreatedResponseSchema, coatListSchema, coatQuerySchema, coatResponseSchema, correctCoatSchema, createCoatSchema } from '../../shared/schemas/coat';
import { idParamsSchema } from '../../shared/schemas/common';
import { defineRoute, Reply, type ApiRoute } from '../registry/route';

/** The coat log is each site's: coats belong to their spray session's booth's site. */
export const coatRoutes: ApiRoute[] = [
  defineRoute({
    method: 'post',
    path: '/api/coats',
    summary: 'Record a coat (a replayed idempotency key answers 200 with the record already made)',
    access: 'coats:write',
    sites: 'site',
    body: createCoatSchema,
    response: { status: 201, otherStatuses: [200], schema: coatCreatedResponseSchema },
    handler: async ({ body }, { services, runner }) => {
      const { coat, replayed } = await services.coats.create(body, runner);
      return new Reply(replayed ? 200 : 201, { coat, replayed });
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/coats',
    summary: 'The coat log, newest first (?spraySessionId, partId, jobId, productId, from, to, history)',
    access: 'coats:read',
    sites: 'site',
    query: coatQuerySchema,
    response: { status: 200, schema: coatListSchema },
    // Coats name parts and jobs, which are the whole group's.
    cache: { clearedBy: 'any' },
    handler: ({ query }, { services }) => services.coats.list(query),
  }),
  defineRoute({
    method: 'get',
    path: '/api/coats/:id',
    summary: 'One coat record',
    access: 'coats:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: coatResponseSchema },
    handler: async ({ params }, { services }) => ({ coat: await services.coats.get(params.id) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/coats/:id/corrections',
    summary: 'Correct a coat: a new version that supersedes it (the record itself never changes)',
    access: 'coats:write',
    sites: 'site',
    params: idParamsSchema,
    body: correctCoatSchema,
    response: { status: 201, schema: coatResponseSchema },
    handler: async ({ params, body }, { services, runner }) => ({ coat: await services.coats.correct(params.id, body, runner) }),
  }),
];
