import { In } from 'typeorm';
import type { SiteData } from '../data/site-data';
import type { Actor } from './audit';
import { jobsPartsOf, refreshJobStates } from './job-states';

/**
 * After a coat, denib or collection: stores each part's state (for lists and job progress; the
 * ready board recomputes it live) and moves the parts' jobs along their life cycle. The parts are
 * the ones the caller just worked on, so they are the scope's to change. Their jobs' parts are
 * read and worked out once, for the parts' own states and for the jobs'.
 */
export async function refreshPartStates(tx: SiteData, partIds: number[], actor: Actor, now: Date): Promise<void> {
  const parts = await tx.parts.findBy({ id: In([...new Set(partIds)]) });
  const jobIds = parts.map((p) => p.jobId);
  const jobsParts = await jobsPartsOf(tx, jobIds, now);
  for (const part of parts) {
    const state = jobsParts.readiness.get(part.id)!.state;
    if (state !== part.state) await tx.parts.update({ id: part.id }, { state, updatedAt: now.toISOString() });
  }
  await refreshJobStates(tx, jobIds, actor, now, jobsParts);
}
