import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error';
import type { ReadingService } from '../services/readings';

/** `Authorization: Bearer <booth sensor token>` on POST /api/readings stands in for a session (and its CSRF token). */
export function sensorAuth(readings: ReadingService): RequestHandler {
  return async (req, _res, next) => {
    const header = req.get('authorization');
    if (!header?.startsWith('Bearer ') || req.method !== 'POST' || req.path !== '/readings') return next();
    const boothId = await readings.boothForToken(header.slice('Bearer '.length).trim());
    if (boothId === null) return next(new AppError('unauthenticated', 'The sensor token is not valid'));
    req.sensorBooth = boothId;
    next();
  };
}
