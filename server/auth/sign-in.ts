import type { NextFunction, Request, Response } from 'express';
import type passport from 'passport';
import type { SignedInUser } from '../../shared/schemas/auth';
import { signInCookieName } from '../middleware/sign-in-session';

/** Checks the e-mail and password in `req.body` with passport-local; false when they do not match an active user. */
export function authenticate(auth: passport.PassportStatic, req: Request, res: Response): Promise<SignedInUser | false> {
  return new Promise((resolve, reject) => {
    const next: NextFunction = (error?: unknown) => (error ? reject(error) : resolve(false));
    auth.authenticate('local', (error: unknown, user: SignedInUser | false) => (error ? reject(error) : resolve(user)))(req, res, next);
  });
}

/** Starts the sign-in session. Passport regenerates its id (no fixation); keepSessionInfo carries the CSRF token over. */
export function logIn(req: Request, user: SignedInUser): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, { session: true, keepSessionInfo: true }, (error) => (error ? reject(error) : resolve())));
}

/** Ends the sign-in session and clears its cookie; harmless when nobody is signed in. */
export function logOut(req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    req.logout({ keepSessionInfo: false }, (error) => {
      if (error) return reject(error);
      req.session.destroy(() => {
        res.clearCookie(signInCookieName);
        resolve();
      });
    });
  });
}
