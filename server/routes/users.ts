import { Router } from 'express';
import { idParamsSchema, pageQuerySchema } from '../../shared/schemas/common';
import { createUserSchema, updateUserSchema } from '../../shared/schemas/user';
import { renewSignIn } from '../auth/passport';
import { actorOf } from '../lib/actor';
import { siteScopeOf } from '../lib/site-scope';
import { requirePermission } from '../middleware/permissions';
import type { UserService } from '../services/users';

export function userRoutes(users: UserService): Router {
  const router = Router();

  router.get('/', requirePermission('users:read'), async (req, res) => {
    res.json(await users.list(pageQuerySchema.parse(req.query)));
  });

  router.post('/', requirePermission('users:write'), async (req, res) => {
    res.status(201).json({ user: await users.create(createUserSchema.parse(req.body), actorOf(req), siteScopeOf(req).homeSiteId) });
  });

  router.patch('/:id', requirePermission('users:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const patch = updateUserSchema.parse(req.body);
    const user = await users.update(id, patch, actorOf(req));
    if (patch.password && id === req.user!.id) await renewSignIn(req);
    res.json({ user });
  });

  return router;
}
