import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/app-error';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Synchroniser token kept in the session; sign-in carries it over to the new session id. */
export function csrfToken(req: Request): string {
  req.session.csrfToken ??= randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

function matches(expected: string | undefined, given: unknown): boolean {
  if (!expected || typeof given !== 'string') return false;
  const a = Buffer.from(expected);
  const b = Buffer.from(given);
  return a.length === b.length && timingSafeEqual(a, b);
}

export const requireCsrf: RequestHandler = (req, _res, next) => {
  if (safeMethods.has(req.method) || req.sensorBooth) return next();
  if (matches(req.session?.csrfToken, req.get('x-csrf-token'))) return next();
  next(new AppError('csrf_invalid', 'The form has expired or the security token is missing; reload the page and try again'));
};
