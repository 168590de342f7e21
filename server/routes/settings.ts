import { Router } from 'express';
import { pageQuerySchema } from '../../shared/schemas/common';
import { updateShopSettingsSchema } from '../../shared/schemas/settings';
import { actorOf } from '../lib/actor';
import { requirePermission } from '../middleware/permissions';
import { listAudit } from '../services/audit';
import type { SettingsService } from '../services/settings';
import type { DataSource } from 'typeorm';

export function settingsRoutes(settings: SettingsService): Router {
  const router = Router();

  router.get('/', requirePermission('settings:read'), async (_req, res) => {
    res.json({ settings: await settings.get() });
  });

  router.patch('/', requirePermission('settings:write'), async (req, res) => {
    res.json({ settings: await settings.update(updateShopSettingsSchema.parse(req.body), actorOf(req)) });
  });

  return router;
}

export function auditRoutes(dataSource: DataSource): Router {
  const router = Router();
  router.get('/', requirePermission('audit:read'), async (req, res) => {
    res.json(await listAudit(dataSource.manager, pageQuerySchema.parse(req.query)));
  });
  return router;
}
