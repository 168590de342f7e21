import { Router, type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import type passport from 'passport';
import { loginSchema, type SessionUser } from '../../shared/schemas/auth';
import { updateMeSchema } from '../../shared/schemas/user';
import { AppError } from '../lib/app-error';
import { actorOf } from '../lib/actor';
import { csrfToken } from '../middleware/csrf';
import { requireSignIn } from '../middleware/permissions';
import type { UserService } from '../services/users';

function authenticate(auth: passport.PassportStatic, req: Request, res: Response, next: NextFunction): Promise<SessionUser | false> {
  return new Promise((resolve, reject) => {
    auth.authenticate('local', (error: unknown, user: SessionUser | false) => (error ? reject(error) : resolve(user)))(req, res, next);
  });
}

function logIn(req: Request, user: SessionUser): Promise<void> {
  // Passport regenerates the session id (no fixation); keepSessionInfo carries the CSRF token over.
  return new Promise((resolve, reject) => req.logIn(user, { session: true, keepSessionInfo: true }, (error) => (error ? reject(error) : resolve())));
}

export function authRoutes(auth: passport.PassportStatic, users: UserService, loginLimits: RequestHandler[]): Router {
  const router = Router();
  router.get('/csrf', (req, res) => {
    res.json({ token: csrfToken(req) });
  });

  router.post('/login', ...loginLimits, async (req, res, next) => {
    req.body = loginSchema.parse(req.body);
    const user = await authenticate(auth, req, res, next);
    if (!user) throw new AppError('unauthenticated', 'E-mail or password is wrong, or the account is disabled');
    await logIn(req, user);
    res.json({ user });
  });

  router.post('/logout', (req, res, next) => {
    req.logout({ keepSessionInfo: false }, (error) => {
      if (error) return next(error);
      req.session.destroy(() => {
        res.clearCookie('bw.sid');
        res.status(204).end();
      });
    });
  });

  router.get('/me', requireSignIn, (req, res) => {
    res.json({ user: req.user });
  });

  router.patch('/me', requireSignIn, async (req, res) => {
    const patch = updateMeSchema.parse(req.body);
    res.json({ user: await users.updateSelf(req.user!.id, patch, actorOf(req)) });
  });

  return router;
}
