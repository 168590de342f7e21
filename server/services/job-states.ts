import { In } from 'typeorm';
import { jobLifeCycle, jobStateAt } from '../../shared/finishing/job-state';
import type { JobState } from '../../shared/schemas/job';
import type { SiteData } from '../data/site-data';
import type { JobEntity } from '../db/entities/job.entity';
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
 * A job is the group's, so all its parts count, at every site.
 */
export async function refreshJobStates(tx: SiteData, jobIds: number[], actor: Actor, now: Date): Promise<void> {
  const ids = [...new Set(jobIds)];
  if (ids.length === 0) return;
  const jobs = await tx.jobs.findBy({ id: In(ids) });
  for (const job of jobs.filter((j) => !heldByLead(j))) {
    const parts = await tx.acrossSites.parts.findBy({ jobId: job.id });
    const next = jobLifeCycle([...(await readinessOf(tx, parts, now)).values()], now);
    const readyAt = next.readyAt?.toISOString() ?? null;
    if (next.state === job.state && readyAt === job.readyAt && job.stateSetBy === 'auto') continue;
    const before = jobStateAt(job.state, job.readyAt, now);
    await tx.jobs.update({ id: job.id }, { state: next.state, readyAt, stateSetBy: 'auto', updatedAt: now.toISOString() });
    if (before !== next.state) {
      const summary = `Job ${job.reference} is ${jobStateWords[next.state]} (was ${jobStateWords[before]})`;
      await recordAudit(tx, actor, { action: 'state', entity: 'job', entityId: job.id, summary, changes: { state: { from: before, to: next.state } } }, now);
    }
  }
}
