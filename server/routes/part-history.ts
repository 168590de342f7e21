import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import { requirePermission } from '../middleware/permissions';
import type { PartHistoryService } from '../services/part-history';

/** Every role that reads the ready board may read a part's coats, next step and times (the rack tag's page). */
export function partHistoryRoutes(history: PartHistoryService): Router {
  const router = Router();
  router.get('/:id/history', requirePermission('ready:read'), async (req, res) => {
    res.json({ history: await history.get(idParamsSchema.parse(req.params).id) });
  });
  return router;
}
