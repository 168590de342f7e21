import { Router } from 'express';
import { correctCoatSchema, coatQuerySchema, createCoatSchema } from '../../shared/schemas/coat';
import { idParamsSchema } from '../../shared/schemas/common';
import { runnerOf } from '../lib/actor';
import { requirePermission } from '../middleware/permissions';
import type { CoatService } from '../services/coats';

export function coatRoutes(coats: CoatService): Router {
  const router = Router();

  router.post('/', requirePermission('coats:write'), async (req, res) => {
    const { coat, replayed } = await coats.create(createCoatSchema.parse(req.body), runnerOf(req));
    // A replay of an idempotency key answers with the record already made, never a second one.
    res.status(replayed ? 200 : 201).json({ coat, replayed });
  });

  router.get('/', requirePermission('coats:read'), async (req, res) => {
    res.json(await coats.list(coatQuerySchema.parse(req.query)));
  });

  router.get('/:id', requirePermission('coats:read'), async (req, res) => {
    res.json({ coat: await coats.get(idParamsSchema.parse(req.params).id) });
  });

  router.post('/:id/corrections', requirePermission('coats:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.status(201).json({ coat: await coats.correct(id, correctCoatSchema.parse(req.body), runnerOf(req)) });
  });

  return router;
}
