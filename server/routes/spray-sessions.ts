import { can } from '../../shared/permissions';
import { createMixSchema, mixListSchema, mixResponseSchema } from '../../shared/schemas/checklist';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  createSpraySessionSchema,
  spraySessionCautionsSchema,
  spraySessionListSchema,
  spraySessionQuerySchema,
  spraySessionResponseSchema,
  updateSpraySessionSchema,
} from '../../shared/schemas/spray-session';
import { sessionFitnessResponseSchema } from '../../shared/schemas/upkeep';
import { defineRoute, Reply, type ApiRoute } from '../registry/route';

/** Spray sessions belong to their booth's site, and so do their pots and cautions. */
export const spraySessionRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/spray-sessions',
    summary: 'Spray sessions overlapping from–to (?boothId; an admin ?siteId)',
    access: 'spray-sessions:read',
    sites: 'site',
    query: spraySessionQuerySchema,
    response: { status: 200, schema: spraySessionListSchema },
    // What each session sprays reads parts seen from every site, and which bookings are still live depends on the time.
    cache: { clearedBy: 'any', clock: true },
    handler: ({ query }, { services }) => services.spraySessions.list(query),
  }),
  defineRoute({
    method: 'post',
    path: '/api/spray-sessions',
    summary: 'Book booth time (409 when it overlaps; the sprayer must work at the booth’s site)',
    access: 'spray-sessions:write',
    sites: 'site',
    body: createSpraySessionSchema,
    response: { status: 201, schema: spraySessionResponseSchema },
    handler: async ({ body }, { services, actor }) => ({ spraySession: await services.spraySessions.create(body, actor) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/spray-sessions/:id',
    summary: 'One spray session',
    access: 'spray-sessions:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: spraySessionResponseSchema },
    handler: async ({ params }, { services }) => ({ spraySession: await services.spraySessions.get(params.id) }),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/spray-sessions/:id',
    summary: 'Move, resize or progress a session (a sprayer: only the state, notes and checklist of their own; a replayed idempotency key answers as the first time)',
    access: 'spray-sessions:run',
    sites: 'site',
    params: idParamsSchema,
    body: updateSpraySessionSchema,
    response: { status: 200, schema: spraySessionResponseSchema },
    handler: async ({ params, body }, { services, actor, user }) => {
      const spraySessionActor = { ...actor, mayOverride: can(user?.role, 'spray-sessions:write') };
      return { spraySession: await services.spraySessions.update(params.id, body, spraySessionActor) };
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/spray-sessions/:id/cautions',
    summary: 'Respiratory, ventilation and clearance cautions for the session’s products and booth',
    access: 'spray-sessions:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: spraySessionCautionsSchema },
    handler: ({ params }, { services, user }) => services.cautions.forSpraySession(params.id, user),
  }),
  defineRoute({
    method: 'get',
    path: '/api/spray-sessions/:id/fitness',
    summary: 'Fit to spray: the booth’s upkeep and the assigned sprayer’s protection records, for each respiratory protection (the sprayer’s part only for the admin, a lead or the sprayer)',
    access: 'upkeep:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: sessionFitnessResponseSchema },
    handler: async ({ params }, { services, user }) => ({ fitness: await services.fitness.forSpraySession(params.id, user) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/spray-sessions/:id/mixes',
    summary: 'The pots mixed for a session, newest first',
    access: 'spray-sessions:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: mixListSchema },
    handler: async ({ params }, { services }) => ({ items: await services.mixes.list(params.id) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/spray-sessions/:id/mixes',
    summary: 'Record a pot: quantities, induction and pot life at the mixing temperature (a replayed idempotency key answers 200 with the pot already recorded)',
    access: 'coats:write',
    sites: 'site',
    params: idParamsSchema,
    body: createMixSchema,
    response: { status: 201, otherStatuses: [200], schema: mixResponseSchema },
    handler: async ({ params, body }, { services, runner }) => {
      const { result, replayed } = await services.mixes.create(params.id, body, runner);
      return new Reply(replayed ? 200 : 201, { mix: result });
    },
  }),
];
