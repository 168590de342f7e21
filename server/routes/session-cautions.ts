import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { sessionCautions } from '../../shared/finishing/cautions';
import { idParamsSchema } from '../../shared/schemas/common';
import { sprayerQuerySchema } from '../../shared/schemas/sprayer';
import { BoothEntity } from '../db/entities/booth.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { notFound } from '../lib/app-error';
import { siteScopeOf } from '../lib/site-scope';
import { requirePermission } from '../middleware/permissions';
import { toBoothDto } from '../services/booths';
import { sessionProducts } from '../services/session-products';
import { createSprayerService } from '../services/sprayers';

/** Cautions worked out on the server, so every role sees them (assemblers cannot read data sheets). */
export function sessionCautionRoutes(dataSource: DataSource): Router {
  const router = Router();
  router.get('/spray-sessions/:id/cautions', requirePermission('spray-sessions:read'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const session = await dataSource.getRepository(SpraySessionEntity).findOneBy({ id });
    if (!session) throw notFound('Spray session');
    const booth = toBoothDto((await dataSource.getRepository(BoothEntity).findOneBy({ id: session.boothId }))!);
    const products = await sessionProducts(dataSource.manager, id);
    res.json({ products: products.map((p) => ({ name: p.name, chemistry: p.chemistry, hazards: p.hazards })), cautions: sessionCautions(products, { ...booth, name: booth.name }) });
  });
  // Who can be given a spray session: the lead needs this without seeing every user.
  const sprayers = createSprayerService(dataSource);
  router.get('/sprayers', requirePermission('spray-sessions:read'), async (req, res) => {
    res.json({ items: await sprayers.list(sprayerQuerySchema.parse(req.query), siteScopeOf(req)) });
  });
  return router;
}
