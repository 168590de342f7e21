import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import { readingQuerySchema } from '../../shared/schemas/reading';
import { readyQuerySchema } from '../../shared/schemas/ready';
import { actorOf } from '../lib/actor';
import { requirePermission, requireSignIn } from '../middleware/permissions';
import type { RequestHandler } from 'express';
import type { EventBus } from '../services/events';
import type { ReadingService } from '../services/readings';
import type { ReadyService } from '../services/ready';

export function readyRoutes(ready: ReadyService): Router {
  const router = Router();
  router.get('/', requirePermission('ready:read'), async (req, res) => {
    res.json(await ready.list(readyQuerySchema.parse(req.query)));
  });
  return router;
}

/** A booth sensor's bearer token (checked by sensorAuth) stands in for the permission. */
const sensorOr =
  (check: RequestHandler): RequestHandler =>
  (req, res, next) =>
    req.sensorBooth !== undefined ? next() : check(req, res, next);

export function readingRoutes(readings: ReadingService): Router {
  const router = Router();
  router.post('/', sensorOr(requirePermission('readings:write')), async (req, res) => {
    const source = req.sensorBooth !== undefined ? { userId: null, sensorBoothId: req.sensorBooth } : { userId: req.user!.id };
    res.status(201).json({ reading: await readings.record(req.body, source) });
  });
  router.get('/', requirePermission('booths:read'), async (req, res) => {
    res.json(await readings.list(readingQuerySchema.parse(req.query)));
  });
  return router;
}

export function sensorTokenRoutes(readings: ReadingService): Router {
  const router = Router();
  router.post('/:id/sensor-token', requirePermission('booths:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.status(201).json({ token: await readings.issueSensorToken(id, actorOf(req)) });
  });
  return router;
}

/** Server-sent events: every change to coats, spray sessions and parts, for the live views. */
export function eventRoutes(events: EventBus): Router {
  const router = Router();
  router.get('/', requireSignIn, (req, res) => {
    res.writeHead(200, { 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-cache, no-transform', Connection: 'keep-alive', 'X-Accel-Buffering': 'no' });
    res.write('retry: 3000\n\n');
    const unsubscribe = events.subscribe((event) => res.write(`event: change\ndata: ${JSON.stringify(event)}\n\n`));
    // A comment line now and then keeps proxies from closing an idle stream.
    const heartbeat = setInterval(() => res.write(': keep-alive\n\n'), 20_000);
    req.on('close', () => {
      clearInterval(heartbeat);
      unsubscribe();
    });
  });
  return router;
}
