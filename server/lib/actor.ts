import type { Request } from 'express';
import type { Actor } from '../services/audit';

export function actorOf(req: Request): Actor {
  return req.user ? { id: req.user.id, name: req.user.name } : { id: null, name: 'anonymous' };
}
