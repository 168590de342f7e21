import { In, IsNull, Not } from 'typeorm';
import type { PartReadiness } from '../../shared/finishing/readiness';
import { jobRisk, riskHorizonDays, sensorIsStale } from '../../shared/finishing/day-board';
import type { LeadBoard } from '../../shared/schemas/today';
import { calendarDateIn } from '../../shared/time';
import type { SiteData } from '../data/site-data';
import type { JobEntity } from '../db/entities/job.entity';
import type { PartEntity } from '../db/entities/part.entity';
import { bookedStepsOf } from './booked-steps';
import { currentCoatsByPart, stepsByJob } from './part-coats';
import { partsSeenBy } from './part-sites';
import type { PlannerService } from './planner';
import { readinessOf } from './ready';

type Counted<T> = T & { parts: PartEntity[] };

function groupBy<T>(parts: PartEntity[], keyOf: (part: PartEntity) => string | null, start: (part: PartEntity) => T): Counted<T>[] {
  const groups = new Map<string, Counted<T>>();
  for (const part of parts) {
    const key = keyOf(part);
    if (key === null) continue;
    const group = groups.get(key) ?? { ...start(part), parts: [] };
    group.parts.push(part);
    groups.set(key, group);
  }
  return [...groups.values()];
}

/**
 * The site's parts of the open jobs that are between coats: whose recoat window closes before the
 * shop day ends (and whether their next coat is booked in time at the site), and who must be
 * denibbed first.
 */
export async function partsBetweenCoats(data: SiteData, work: JobsInWork, now: Date, endOfToday: Date): Promise<Pick<LeadBoard, 'recoatClosing' | 'denibWaiting'>> {
  const { jobs, parts } = work;
  const readiness = await readinessOf(data, parts, now);
  const jobOf = new Map(jobs.map((j) => [j.id, j]));
  const inFinish = parts.filter((p) => readiness.get(p.id)!.state === 'in-finish');
  const closing = (r: PartReadiness) => !r.abradeRequired && r.nextWindow?.closesAt && r.nextWindow.closesAt > now && r.nextWindow.closesAt <= endOfToday;
  const closingParts = inFinish.filter((p) => closing(readiness.get(p.id)!));
  const [coats, steps] = await Promise.all([currentCoatsByPart(data.acrossSites, closingParts.map((p) => p.id)), stepsByJob(data, closingParts)]);
  const booked = await bookedStepsOf(data, closingParts, { coats, steps, now });

  const recoatClosing = groupBy(
    closingParts,
    (p) => `${p.jobId}:${readiness.get(p.id)!.nextWindow!.closesAt!.toISOString()}`,
    (p) => ({ job: jobOf.get(p.jobId)!, readiness: readiness.get(p.id)! }),
  ).map(({ job, readiness: r, parts: group }) => {
    const closesAt = r.nextWindow!.closesAt!;
    const inTime = booked.filter((b) => group.some((p) => p.id === b.partId) && b.stepPosition === r.nextStepIndex && b.start <= closesAt).sort((a, b) => a.start.getTime() - b.start.getTime())[0];
    return {
      jobId: job.id,
      jobReference: job.reference,
      customer: job.customer,
      partCount: group.length,
      closesAt: closesAt.toISOString(),
      nextStep: `Coat ${r.coatsDone + 1} of ${r.coatsTotal}`,
      bookedSessionId: inTime?.sessionId ?? null,
      bookedStart: inTime ? inTime.start.toISOString() : null,
    };
  });

  const denibWaiting = groupBy(
    inFinish.filter((p) => readiness.get(p.id)!.abradeRequired),
    (p) => String(p.jobId),
    (p) => ({ job: jobOf.get(p.jobId)!, readiness: readiness.get(p.id)! }),
  ).map(({ job, readiness: r, parts: group }) => ({
    jobId: job.id,
    jobReference: job.reference,
    customer: job.customer,
    partCount: group.length,
    grit: r.nextStep?.kind === 'abrade' ? r.nextStep.grit : 'P320',
    missedWindowCount: group.filter((p) => readiness.get(p.id)!.recoatWindowMissed).length,
  }));
  return { recoatClosing: recoatClosing.sort((a, b) => a.closesAt.localeCompare(b.closesAt)), denibWaiting };
}

/** The jobs a site is working on, with their parts still at (or not yet placed off) the site. */
export interface JobsInWork {
  jobs: JobEntity[];
  parts: PartEntity[];
}

/**
 * Jobs the scope's site still works on: some uncollected part it sees (on its racks, last coated
 * there, or not yet begun), or no parts yet. A job whose parts are all collected is delivered,
 * whatever its state says; one whose parts are all at another site is that site's.
 */
export async function jobsInWork(data: SiteData, jobs: JobEntity[]): Promise<JobsInWork> {
  if (jobs.length === 0) return { jobs: [], parts: [] };
  const ids = jobs.map((j) => j.id);
  const rows: { jobId: number }[] = await data.parts.select('p').select('DISTINCT p.job_id', 'jobId').where('p.job_id IN (:...ids)', { ids }).getRawMany();
  const withParts = new Set(rows.map((r) => Number(r.jobId)));
  const open = await data.parts.findBy({ jobId: In(ids), collectedAt: IsNull() });
  const seen = await partsSeenBy(data, open);
  const parts = open.filter((p) => seen.has(p.id));
  const active = new Set(parts.map((p) => p.jobId));
  return { jobs: jobs.filter((j) => !withParts.has(j.id) || active.has(j.id)), parts };
}

/** Jobs past their due date, or whose earliest plan (on their own, in free booth time) packs after it. */
export async function jobsAtRisk(planner: PlannerService, jobs: JobEntity[], context: { today: string; timeZone: string }): Promise<LeadBoard['jobsAtRisk']> {
  const finishes = await planner.earliestFinishes(jobs, riskHorizonDays);
  return jobs.flatMap((job) => {
    const plan = finishes.get(job.id);
    const readyToPackOn = plan?.finishesAt ? calendarDateIn(plan.finishesAt, context.timeZone) : null;
    const risk = jobRisk({ dueDate: job.dueDate, today: context.today, readyToPackOn, coatsLeft: plan !== undefined });
    return risk ? [{ jobId: job.id, jobReference: job.reference, customer: job.customer, dueDate: job.dueDate, reason: risk.reason, words: risk.words }] : [];
  });
}

/** The scope's booths with a sensor whose readings have stopped coming. */
export async function staleSensors(data: SiteData, now: Date): Promise<LeadBoard['staleSensors']> {
  const booths = await data.booths.find({ where: { sensorTokenHash: Not(IsNull()) }, order: { id: 'ASC' } });
  const latest = await Promise.all(booths.map((b) => data.readings.findOne({ where: { boothId: b.id, source: 'sensor' }, order: { at: 'DESC' } })));
  return booths.flatMap((booth, i) => {
    const at = latest[i]?.at ?? null;
    return sensorIsStale(at ? new Date(at) : null, now) ? [{ boothId: booth.id, boothName: booth.name, lastReadingAt: at }] : [];
  });
}
