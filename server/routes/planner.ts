import { Router } from 'express';
import { acceptPlanSchema, planRequestSchema } from '../../shared/schemas/planner';
import { actorOf } from '../lib/actor';
import { siteScopeOf } from '../lib/site-scope';
import { requirePermission } from '../middleware/permissions';
import type { PlannerService } from '../services/planner';
import type { SpraySessionService } from '../services/spray-sessions';

export function plannerRoutes(planner: PlannerService, sessions: SpraySessionService): Router {
  const router = Router();

  // A proposal only: nothing is booked until the lead accepts it.
  router.post('/proposals', requirePermission('spray-sessions:write'), async (req, res) => {
    const { jobIds, horizonDays } = planRequestSchema.parse(req.body);
    const plan = await planner.propose(jobIds, horizonDays, siteScopeOf(req));
    const iso = (d: Date | null) => (d ? d.toISOString() : null);
    res.json({
      plan: {
        sessions: plan.sessions.map((s) => ({ ...s, start: s.start.toISOString(), end: s.end.toISOString() })),
        jobs: plan.jobs.map((j) => ({ ...j, finishesAt: iso(j.finishesAt) })),
      },
    });
  });

  router.post('/accept', requirePermission('spray-sessions:write'), async (req, res) => {
    const { sessions: wanted } = acceptPlanSchema.parse(req.body);
    res.status(201).json({ items: await sessions.createAll(wanted, actorOf(req), siteScopeOf(req)) });
  });

  return router;
}
