import { createDenibSchema, denibListSchema, denibQuerySchema, denibResponseSchema } from '../../shared/schemas/denib';
import { defineRoute, Reply, type ApiRoute } from '../registry/route';

/**
 * Denibs are written and read like coats: a sprayer on the spray sessions assigned to them, a lead
 * or owner on any; each site's denibs are those of its booths' spray sessions.
 */
export const denibRoutes: ApiRoute[] = [
  defineRoute({
    method: 'post',
    path: '/api/denibs',
    summary: 'Record a denib between coats (append-only; parts at the spray session’s site; a sprayer on their own sessions; a replayed idempotency key answers 200 with the denib already recorded)',
    access: 'coats:write',
    sites: 'site',
    body: createDenibSchema,
    response: { status: 201, otherStatuses: [200], schema: denibResponseSchema },
    handler: async ({ body }, { services, runner }) => {
      const { result, replayed } = await services.denibs.create(body, runner);
      return new Reply(replayed ? 200 : 201, { denib: result });
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/denibs',
    summary: 'Denib records of the caller’s site, newest first (?partId, spraySessionId, jobId, from, to)',
    access: 'coats:read',
    sites: 'site',
    query: denibQuerySchema,
    response: { status: 200, schema: denibListSchema },
    handler: ({ query }, { services }) => services.denibs.list(query),
  }),
];
