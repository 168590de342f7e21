import { Router } from 'express';
import { todayQuerySchema } from '../../shared/schemas/today';
import { siteScopeOf } from '../lib/site-scope';
import { requirePermission } from '../middleware/permissions';
import type { TodayService } from '../services/today';

export function todayRoutes(today: TodayService): Router {
  const router = Router();

  // The day's board in one call, shaped by the caller's role and held to their site.
  router.get('/', requirePermission('today:read'), async (req, res) => {
    todayQuerySchema.parse(req.query);
    res.json({ today: await today.board({ id: req.user!.id, role: req.user!.role }, siteScopeOf(req)) });
  });

  return router;
}
