import { Router } from 'express';
import { createDenibSchema, denibQuerySchema } from '../../shared/schemas/denib';
import { runnerOf } from '../lib/actor';
import { requirePermission } from '../middleware/permissions';
import type { DenibService } from '../services/denibs';

/** Denibs are written and read like coats: a sprayer on the sessions assigned to them, a lead or owner on any. */
export function denibRoutes(denibs: DenibService): Router {
  const router = Router();
  router.post('/', requirePermission('coats:write'), async (req, res) => {
    res.status(201).json({ denib: await denibs.create(createDenibSchema.parse(req.body), runnerOf(req)) });
  });
  router.get('/', requirePermission('coats:read'), async (req, res) => {
    res.json(await denibs.list(denibQuerySchema.parse(req.query)));
  });
  return router;
}
