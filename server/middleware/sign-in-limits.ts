import type { Request, RequestHandler } from 'express';
import rateLimit from 'express-rate-limit';
import { AppError } from '../lib/app-error';

const addressWindowMs = 15 * 60 * 1000;
/** Short, so someone guessing at an account can make its owner wait minutes, never hours. */
export const accountWindowMs = 5 * 60 * 1000;

const refuse =
  (message: string): RequestHandler =>
  (_req, _res, next) =>
    next(new AppError('too_many_requests', message));

// Keyed by the e-mail typed, whether or not such a user exists, so the limit says nothing about who has an account.
const accountOf = (req: Request): string => (typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '');

/**
 * Failed sign-ins are limited per address (many accounts tried from one place) and per account
 * (one account tried from many places). The account limit lasts at most five minutes and a
 * successful sign-in clears it; both are per instance (in memory), successful sign-ins never count.
 */
export function signInLimits(perAddress: number, perAccount: number): RequestHandler[] {
  const byAddress = rateLimit({
    windowMs: addressWindowMs,
    limit: perAddress,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: refuse('Too many failed sign-ins; wait 15 minutes and try again'),
  });
  const byAccount = rateLimit({
    windowMs: accountWindowMs,
    limit: perAccount,
    skipSuccessfulRequests: true,
    keyGenerator: (req) => `account:${accountOf(req)}`,
    skip: (req) => accountOf(req) === '',
    standardHeaders: false,
    legacyHeaders: false,
    handler: refuse('Too many failed sign-ins to this account; wait 5 minutes and try again'),
  });
  const clearOnSuccess: RequestHandler = (req, res, next) => {
    const account = accountOf(req);
    res.on('finish', () => {
      if (account && res.statusCode < 400) void byAccount.resetKey(`account:${account}`);
    });
    next();
  };
  return [byAddress, byAccount, clearOnSuccess];
}
