import type { RequestHandler } from 'express';
import { can, type Permission } from '../../shared/permissions';
import { AppError } from '../lib/app-error';

export const requireSignIn: RequestHandler = (req, _res, next) => {
  if (req.user) return next();
  next(new AppError('unauthenticated', 'Sign in to continue'));
};

/** Every route names the permission it needs; the matrix lives in shared/permissions.ts. */
export function requirePermission(permission: Permission): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new AppError('unauthenticated', 'Sign in to continue'));
    if (!can(req.user.role, permission)) {
      return next(new AppError('forbidden', `Your role (${req.user.role}) may not do this`));
    }
    next();
  };
}
