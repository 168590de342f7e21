import { Router } from 'express';
import { can } from '../../shared/permissions';
import { idParamsSchema } from '../../shared/schemas/common';
import { createSpraySessionSchema, spraySessionQuerySchema, updateSpraySessionSchema } from '../../shared/schemas/spray-session';
import { AppError } from '../lib/app-error';
import { actorOf, runnerOf } from '../lib/actor';
import { siteScopeOf } from '../lib/site-scope';
import { requirePermission } from '../middleware/permissions';
import type { MixService } from '../services/mixes';
import type { SpraySessionService } from '../services/spray-sessions';
import { createMixSchema } from '../../shared/schemas/checklist';

// What a sprayer may change on a session assigned to them: its progress, not its booking.
const runnerFields = new Set(['state', 'notes', 'checklist']);

export function spraySessionRoutes(sessions: SpraySessionService, mixes: MixService): Router {
  const router = Router();

  router.get('/:id/mixes', requirePermission('spray-sessions:read'), async (req, res) => {
    res.json({ items: await mixes.list(idParamsSchema.parse(req.params).id) });
  });

  router.post('/:id/mixes', requirePermission('coats:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.status(201).json({ mix: await mixes.create(id, createMixSchema.parse(req.body), runnerOf(req)) });
  });

  router.get('/', requirePermission('spray-sessions:read'), async (req, res) => {
    res.json(await sessions.list(spraySessionQuerySchema.parse(req.query), siteScopeOf(req)));
  });

  router.post('/', requirePermission('spray-sessions:write'), async (req, res) => {
    res.status(201).json({ spraySession: await sessions.create(createSpraySessionSchema.parse(req.body), actorOf(req), siteScopeOf(req)) });
  });

  router.get('/:id', requirePermission('spray-sessions:read'), async (req, res) => {
    res.json({ spraySession: await sessions.get(idParamsSchema.parse(req.params).id, siteScopeOf(req)) });
  });

  router.patch('/:id', requirePermission('spray-sessions:run'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const patch = updateSpraySessionSchema.parse(req.body);
    if (!can(req.user!.role, 'spray-sessions:write')) {
      const session = await sessions.get(id, siteScopeOf(req));
      const onlyProgress = Object.keys(patch).every((key) => runnerFields.has(key));
      if (session.sprayerId !== req.user!.id || !onlyProgress) throw new AppError('forbidden', 'Sprayers may only move their own sessions through their steps; ask the finishing lead to rebook');
    }
    const actor = { ...actorOf(req), mayOverride: can(req.user!.role, 'spray-sessions:write') };
    res.json({ spraySession: await sessions.update(id, patch, actor, siteScopeOf(req)) });
  });

  return router;
}
