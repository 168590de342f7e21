import { Router } from 'express';
import type { z } from 'zod';
import type { Permission } from '../../shared/permissions';
import { idParamsSchema, pageQuerySchema, type List, type PageQuery } from '../../shared/schemas/common';
import { actorOf } from '../lib/actor';
import { siteScopeOf, type SiteScope } from '../lib/site-scope';
import { requirePermission } from '../middleware/permissions';
import type { Actor } from '../services/audit';

interface MasterDataService<D> {
  list(query: PageQuery, scope: SiteScope): Promise<List<D>>;
  get(id: number, scope: SiteScope): Promise<D>;
  create(input: never, actor: Actor, scope: SiteScope): Promise<D>;
  update(id: number, patch: never, actor: Actor, scope: SiteScope): Promise<D>;
}

interface MasterDataRoutes<D> {
  /** The key a single resource is wrapped in: `{ booth: … }`. */
  resource: string;
  read: Permission;
  write: Permission;
  createSchema: z.ZodType;
  updateSchema: z.ZodType;
  service: MasterDataService<D>;
}

/** GET list, POST, GET one and PATCH for a piece of master data (booths, racks), within the caller's sites. */
export function masterDataRoutes<D>({ resource, read, write, createSchema, updateSchema, service }: MasterDataRoutes<D>): Router {
  const router = Router();

  router.get('/', requirePermission(read), async (req, res) => {
    res.json(await service.list(pageQuerySchema.parse(req.query), siteScopeOf(req)));
  });

  router.post('/', requirePermission(write), async (req, res) => {
    const created = await service.create(createSchema.parse(req.body) as never, actorOf(req), siteScopeOf(req));
    res.status(201).json({ [resource]: created });
  });

  router.get('/:id', requirePermission(read), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json({ [resource]: await service.get(id, siteScopeOf(req)) });
  });

  router.patch('/:id', requirePermission(write), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json({ [resource]: await service.update(id, updateSchema.parse(req.body) as never, actorOf(req), siteScopeOf(req)) });
  });

  return router;
}
