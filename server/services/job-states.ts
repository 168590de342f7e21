import { In } from 'typeorm';
import { jobLifeCycle, jobStateAt } from '../../shared/finishing/job-state';
import type { PartReadiness } from '../../shared/finishing/readiness';
import { groupBy } from '../../shared/group-by';
import type { JobState } from '../../shared/schemas/job';
import type { SiteData } from '../data/site-data';
import type { JobEntity } from '../db/entities/job.entity';
import type { PartEntity } from '../db/entities/part.entity';
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

/** Every part of the jobs, at every site, with its readiness at `now`: what moves the jobs (and their parts) along. */
export interface JobsParts {
  parts: PartEntity[];
  readiness: Map<number, PartReadiness>;
}

/** The jobs' parts and their readiness, worked out in one go for all the jobs. */
export async function jobsPartsOf(tx: SiteData, jobIds: number[], now: Date): Promise<JobsParts> {
  const ids = [...new Set(jobIds)];
  const parts = ids.length ? await tx.acrossSites.parts.findBy({ jobId: In(ids) }) : [];
  return { parts, readiness: await readinessOf(tx, parts, now) };
}

/**
 * Moves each job along its life cycle from what is now recorded on its parts (coats, denibs,
 * collections), inside the caller's transaction, with an audit entry when its state changes.
 * A job is the group's, so all its parts count, at every site. A caller that has just worked out
 * the jobs' parts (`jobsPartsOf`) passes them on rather than have them read again.
 */
export async function refreshJobStates(tx: SiteData, jobIds: number[], actor: Actor, now: Date, known?: JobsParts): Promise<void> {
  const ids = [...new Set(jobIds)];
  if (ids.length === 0) return;
  const jobs = await tx.jobs.findBy({ id: In(ids) });
  const moving = jobs.filter((j) => !heldByLead(j));
  if (moving.length === 0) return;
  const { parts, readiness } = known ?? (await jobsPartsOf(tx, moving.map((j) => j.id), now));
  const byJob = groupBy(parts, (p) => p.jobId, (p) => readiness.get(p.id)!);
  for (const job of moving) {
    const next = jobLifeCycle(byJob.get(job.id) ?? [], now);
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
