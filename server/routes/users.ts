import { z } from 'zod';
import { idParamsSchema, pageFields } from '../../shared/schemas/common';
import { siteFilterFields } from '../../shared/schemas/site';
import { createUserSchema, updateUserSchema, userListSchema, userResponseSchema } from '../../shared/schemas/user';
import { renewSignIn } from '../auth/passport';
import { defineRoute, type ApiRoute } from '../registry/route';

export const userRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/users',
    summary: 'List users (every site, or one with ?siteId)',
    access: 'users:read',
    sites: 'site',
    query: z.object({ ...pageFields(50, 200), ...siteFilterFields }),
    response: { status: 200, schema: userListSchema },
    handler: ({ query }, { services }) => services.users.list(query),
  }),
  defineRoute({
    method: 'post',
    path: '/api/users',
    summary: 'Add a user (to the admin’s own site unless siteId names another)',
    access: 'users:write',
    sites: 'site',
    body: createUserSchema,
    response: { status: 201, schema: userResponseSchema },
    handler: async ({ body }, { services, actor }) => ({ user: await services.users.create(body, actor) }),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/users/:id',
    summary: 'Change a user (a new password signs them out everywhere, except an admin’s own current sign-in)',
    access: 'users:write',
    sites: 'site',
    params: idParamsSchema,
    body: updateUserSchema,
    response: { status: 200, schema: userResponseSchema },
    handler: async ({ params, body }, { services, actor, user, req }) => {
      const changed = await services.users.update(params.id, body, actor);
      if (body.password && params.id === user!.id) await renewSignIn(req);
      return { user: changed };
    },
  }),
];
