import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error';
import type { SensorBooth } from '../services/readings';

/**
 * `Authorization: Bearer <booth sensor token>` stands in for a sign-in (and its CSRF token) on the
 * POST routes that take a sensor (`access: { sensorOr }`: the conditions and filter gauge readings);
 * `paths` are those routes' paths under /api.
 */
export function sensorAuth(boothForToken: (token: string) => Promise<SensorBooth | null>, paths: ReadonlySet<string>): RequestHandler {
  return async (req, _res, next) => {
    const header = req.get('authorization');
    if (!header?.startsWith('Bearer ') || req.method !== 'POST' || !paths.has(req.path)) return next();
    const booth = await boothForToken(header.slice('Bearer '.length).trim());
    if (booth === null) return next(new AppError('unauthenticated', 'The sensor token is not valid'));
    req.sensorBooth = booth;
    next();
  };
}
