import type { EntityManager } from 'typeorm';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { AppError } from '../lib/app-error';
import type { Actor } from './audit';

/** Who is writing a coat, pot or correction; a sprayer runs only the sessions assigned to them. */
export interface SessionRunner extends Actor {
  ownSessionsOnly?: boolean;
}

export async function assertRunsSession(manager: EntityManager, spraySessionId: number, runner: SessionRunner): Promise<void> {
  if (!runner.ownSessionsOnly) return;
  const session = await manager.findOneBy(SpraySessionEntity, { id: spraySessionId });
  if (session && session.sprayerId !== runner.id) {
    throw new AppError('forbidden', 'This spray session is not assigned to you; ask the finishing lead to assign it to you before logging on it', { spraySessionId: 'Not your session' });
  }
}
