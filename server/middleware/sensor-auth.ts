import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error';
import type { SensorBooth } from '../services/readings';

/** `Authorization: Bearer <booth sensor token>` on POST /api/readings stands in for a sign-in (and its CSRF token). */
export function sensorAuth(boothForToken: (token: string) => Promise<SensorBooth | null>): RequestHandler {
  return async (req, _res, next) => {
    const header = req.get('authorization');
    if (!header?.startsWith('Bearer ') || req.method !== 'POST' || req.path !== '/readings') return next();
    const booth = await boothForToken(header.slice('Bearer '.length).trim());
    if (booth === null) return next(new AppError('unauthenticated', 'The sensor token is not valid'));
    req.sensorBooth = booth;
    next();
  };
}
