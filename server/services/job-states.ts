import { In, type EntityManager } from 'typeorm';
import { jobLifeCycle, jobStateAt } from '../../shared/finishing/job-state';
import type { JobState } from '../../shared/schemas/job';
import { JobEntity } from '../db/entities/job.entity';
import { PartEntity } from '../db/entities/part.entity';
import { recordAudit, type Actor } from './audit';
import { readinessOf } from './readiness-inputs';

export const jobStateWords: Record<JobState, string> = {
  open: 'open',
  'in-finish': 'in finish',
  ready: 'ready',
  delivered: 'delivered',
  cancelled: 'cancelled',
};

/** A lead's "delivered" or "cancelled" stands until a lead changes it; every other state follows the parts. */
const heldByLead = (job: JobEntity) => job.stateSetBy === 'lead' && (job.state === 'delivered' || job.state === 'cancelled');

/**
 * Moves each job along its life cycle from what is now recorded on its parts (coats, denibs,
 * collections), inside the caller's transaction, with an audit entry when its state changes.
 */
export async function refreshJobStates(manager: EntityManager, jobIds: number[], actor: Actor, now: Date): Promise<void> {
  const ids = [...new Set(jobIds)];
  if (ids.length === 0) return;
  const jobs = await manager.findBy(JobEntity, { id: In(ids) });
  for (const job of jobs.filter((j) => !heldByLead(j))) {
    const parts = await manager.findBy(PartEntity, { jobId: job.id });
    const next = jobLifeCycle([...(await readinessOf(manager, parts, now)).values()], now);
    const readyAt = next.readyAt?.toISOString() ?? null;
    if (next.state === job.state && readyAt === job.readyAt && job.stateSetBy === 'auto') continue;
    const before = jobStateAt(job.state, job.readyAt, now);
    await manager.update(JobEntity, { id: job.id }, { state: next.state, readyAt, stateSetBy: 'auto', updatedAt: now.toISOString() });
    if (before !== next.state) {
      const summary = `Job ${job.reference} is ${jobStateWords[next.state]} (was ${jobStateWords[before]})`;
      await recordAudit(manager, actor, { action: 'state', entity: 'job', entityId: job.id, summary, changes: { state: { from: before, to: next.state } } }, now);
    }
  }
}
