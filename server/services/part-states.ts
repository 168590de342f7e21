import { In, type EntityManager } from 'typeorm';
import { PartEntity } from '../db/entities/part.entity';
import type { Actor } from './audit';
import { refreshJobStates } from './job-states';
import { readinessOf } from './readiness-inputs';

/**
 * After a coat, denib or collection: stores each part's state (for lists and job progress; the
 * ready board recomputes it live) and moves the parts' jobs along their life cycle.
 */
export async function refreshPartStates(manager: EntityManager, partIds: number[], actor: Actor, now: Date): Promise<void> {
  const parts = await manager.findBy(PartEntity, { id: In([...new Set(partIds)]) });
  const readiness = await readinessOf(manager, parts, now);
  for (const part of parts) {
    const state = readiness.get(part.id)!.state;
    if (state !== part.state) await manager.update(PartEntity, { id: part.id }, { state, updatedAt: now.toISOString() });
  }
  await refreshJobStates(manager, parts.map((p) => p.jobId), actor, now);
}
