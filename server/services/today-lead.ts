import { In, IsNull, Not, type EntityManager } from 'typeorm';
import type { PartReadiness } from '../../shared/finishing/readiness';
import { jobRisk, riskHorizonDays, sensorIsStale } from '../../shared/finishing/day-board';
import type { LeadBoard } from '../../shared/schemas/today';
import { calendarDateIn } from '../../shared/time';
import { BoothEntity } from '../db/entities/booth.entity';
import type { JobEntity } from '../db/entities/job.entity';
import { PartEntity } from '../db/entities/part.entity';
import { ReadingEntity } from '../db/entities/reading.entity';
import { bookedStepsOf } from './booked-steps';
import { currentCoatsByPart, stepsByJob } from './part-coats';
import type { PlannerService } from './planner';
import { readinessOf } from './ready';
import type { SiteScope } from '../lib/site-scope';

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
 * Parts of the open jobs that are between coats: whose recoat window closes before the shop day
 * ends (and whether their next coat is booked in time), and who must be denibbed first.
 */
export async function partsBetweenCoats(manager: EntityManager, jobs: JobEntity[], now: Date, endOfToday: Date): Promise<Pick<LeadBoard, 'recoatClosing' | 'denibWaiting'>> {
  const parts = jobs.length ? await manager.findBy(PartEntity, { jobId: In(jobs.map((j) => j.id)), collectedAt: IsNull() }) : [];
  const readiness = await readinessOf(manager, parts, now);
  const jobOf = new Map(jobs.map((j) => [j.id, j]));
  const inFinish = parts.filter((p) => readiness.get(p.id)!.state === 'in-finish');
  const closing = (r: PartReadiness) => !r.abradeRequired && r.nextWindow?.closesAt && r.nextWindow.closesAt > now && r.nextWindow.closesAt <= endOfToday;
  const closingParts = inFinish.filter((p) => closing(readiness.get(p.id)!));
  const [coats, steps] = await Promise.all([currentCoatsByPart(manager, closingParts.map((p) => p.id)), stepsByJob(manager, closingParts)]);
  const booked = await bookedStepsOf(manager, closingParts, { coats, steps, now });

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

/** Jobs not yet handed over: some part still uncollected, or no parts yet. A job whose parts are all collected is delivered, whatever its state says. */
export async function jobsInWork(manager: EntityManager, jobs: JobEntity[]): Promise<JobEntity[]> {
  if (jobs.length === 0) return [];
  const rows: { jobId: number; total: string | number; open: string | number }[] = await manager
    .createQueryBuilder(PartEntity, 'p')
    .select('p.job_id', 'jobId')
    .addSelect('COUNT(*)', 'total')
    .addSelect('SUM(CASE WHEN p.collected_at IS NULL THEN 1 ELSE 0 END)', 'open')
    .where('p.job_id IN (:...ids)', { ids: jobs.map((j) => j.id) })
    .groupBy('p.job_id')
    .getRawMany();
  const delivered = new Set(rows.filter((r) => Number(r.total) > 0 && Number(r.open) === 0).map((r) => Number(r.jobId)));
  return jobs.filter((j) => !delivered.has(j.id));
}

/** Jobs past their due date, or whose earliest plan (on their own, in free booth time) packs after it. */
export async function jobsAtRisk(planner: PlannerService, jobs: JobEntity[], context: { today: string; timeZone: string; scope: SiteScope }): Promise<LeadBoard['jobsAtRisk']> {
  const finishes = await planner.earliestFinishes(jobs, riskHorizonDays, context.scope);
  return jobs.flatMap((job) => {
    const plan = finishes.get(job.id);
    const readyToPackOn = plan?.finishesAt ? calendarDateIn(plan.finishesAt, context.timeZone) : null;
    const risk = jobRisk({ dueDate: job.dueDate, today: context.today, readyToPackOn, coatsLeft: plan !== undefined });
    return risk ? [{ jobId: job.id, jobReference: job.reference, customer: job.customer, dueDate: job.dueDate, reason: risk.reason, words: risk.words }] : [];
  });
}

/** Booths with a sensor whose readings have stopped coming. */
export async function staleSensors(manager: EntityManager, siteId: number | null, now: Date): Promise<LeadBoard['staleSensors']> {
  const booths = await manager.find(BoothEntity, { where: { sensorTokenHash: Not(IsNull()), ...(siteId === null ? {} : { siteId }) }, order: { id: 'ASC' } });
  const latest = await Promise.all(booths.map((b) => manager.findOne(ReadingEntity, { where: { boothId: b.id, source: 'sensor' }, order: { at: 'DESC' } })));
  return booths.flatMap((booth, i) => {
    const at = latest[i]?.at ?? null;
    return sensorIsStale(at ? new Date(at) : null, now) ? [{ boothId: booth.id, boothName: booth.name, lastReadingAt: at }] : [];
  });
}
