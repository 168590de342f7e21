import { Router } from 'express';
import type { z } from 'zod';
import type { Permission } from '../../shared/permissions';
import { idParamsSchema, pageQuerySchema, type List, type PageQuery } from '../../shared/schemas/common';
import { actorOf } from '../lib/actor';
import { requirePermission } from '../middleware/permissions';
import type { Actor } from '../services/audit';

interface MasterDataService<D> {
  list(query: PageQuery): Promise<List<D>>;
  get(id: number): Promise<D>;
  create(input: never, actor: Actor): Promise<D>;
  update(id: number, patch: never, actor: Actor): Promise<D>;
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

/** GET list, POST, GET one and PATCH for a piece of master data (booths, racks). */
export function masterDataRoutes<D>({ resource, read, write, createSchema, updateSchema, service }: MasterDataRoutes<D>): Router {
  const router = Router();

  router.get('/', requirePermission(read), async (req, res) => {
    res.json(await service.list(pageQuerySchema.parse(req.query)));
  });

  router.post('/', requirePermission(write), async (req, res) => {
    const created = await service.create(createSchema.parse(req.body) as never, actorOf(req));
    res.status(201).json({ [resource]: created });
  });

  router.get('/:id', requirePermission(read), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json({ [resource]: await service.get(id) });
  });

  router.patch('/:id', requirePermission(write), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json({ [resource]: await service.update(id, updateSchema.parse(req.body) as never, actorOf(req)) });
  });

  return router;
}
