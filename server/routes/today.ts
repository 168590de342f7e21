import { todayQuerySchema, todayResponseSchema } from '../../shared/schemas/today';
import { defineRoute, type ApiRoute } from '../registry/route';

export const todayRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/today',
    summary:
      'The day’s board for the caller’s role at their site: a lead’s sessions, unassigned work, closing windows, denibs, jobs at risk and stale sensors; a sprayer’s sessions with their next step (an admin ?siteId)',
    access: 'today:read',
    sites: 'site',
    query: todayQuerySchema,
    response: { status: 200, schema: todayResponseSchema },
    // The board is the caller's own (a sprayer's sessions) and its day moves with the clock.
    cache: { clearedBy: 'any', perUser: true, clock: true },
    handler: async (_input, { services, user }) => ({ today: await services.today.board({ id: user!.id, role: user!.role }) }),
  }),
];
