import { csrfResponseSchema, loginSchema, signedInUserResponseSchema, signInStateResponseSchema } from '../../shared/schemas/auth';
import { updateMeSchema } from '../../shared/schemas/user';
import { authenticate, logIn, logOut } from '../auth/sign-in';
import { AppError } from '../lib/app-error';
import { csrfToken } from '../middleware/csrf';
import { answered, defineRoute, type ApiRoute } from '../registry/route';

export const authRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/auth/csrf',
    summary: 'CSRF token for mutating requests',
    access: 'public',
    sites: 'own',
    response: { status: 200, schema: csrfResponseSchema },
    handler: (_input, { req }) => ({ token: csrfToken(req) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/auth/login',
    summary: 'Sign in (failed attempts are limited per address and per account)',
    access: 'public',
    sites: 'own',
    limit: 'sign-in',
    body: loginSchema,
    response: { status: 200, schema: signedInUserResponseSchema },
    handler: async (_input, { auth, req, res }) => {
      const user = await authenticate(auth, req, res);
      if (!user) throw new AppError('unauthenticated', 'E-mail or password is wrong, or the account is disabled');
      await logIn(req, user);
      return { user };
    },
  }),
  defineRoute({
    method: 'post',
    path: '/api/auth/logout',
    summary: 'Sign out (harmless when not signed in)',
    access: 'public',
    sites: 'own',
    response: { status: 204 },
    handler: async (_input, { req, res }) => {
      await logOut(req, res);
      res.status(204).end();
      return answered;
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/auth/session',
    summary: 'Who is signed in on this browser (user is null when nobody is), so a signed-out visitor gets an answer, not a 401',
    access: 'public',
    sites: 'own',
    response: { status: 200, schema: signInStateResponseSchema },
    handler: (_input, { user }) => ({ user }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/auth/me',
    summary: 'The signed-in user',
    access: 'signed-in',
    sites: 'own',
    response: { status: 200, schema: signedInUserResponseSchema },
    handler: (_input, { user }) => ({ user }),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/auth/me',
    summary: 'Change own name, units or e-mail choices',
    access: 'signed-in',
    sites: 'own',
    body: updateMeSchema,
    response: { status: 200, schema: signedInUserResponseSchema },
    handler: async ({ body }, { services, user, actor }) => ({ user: await services.users.updateSelf(user!.id, body, actor) }),
  }),
];
