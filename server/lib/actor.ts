import type { Request } from 'express';
import { can } from '../../shared/permissions';
import type { Actor } from '../services/audit';
import type { SessionRunner } from '../services/session-runner';

export function actorOf(req: Request): Actor {
  return req.user ? { id: req.user.id, name: req.user.name } : { id: null, name: 'anonymous' };
}

/** The actor for coat, pot and correction writes: anyone who may not book sessions runs only their own. */
export function runnerOf(req: Request): SessionRunner {
  return { ...actorOf(req), ownSessionsOnly: !can(req.user?.role, 'spray-sessions:write') };
}
