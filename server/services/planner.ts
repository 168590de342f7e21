import { In, IsNull, Not } from 'typeorm';
import { autoPlan, type BookedStep, type JobPlan, type Plan, type PlanInput, type PlanJob, type PlanStep, type RecordedCoat } from '../../shared/finishing/auto-plan';
import type { FinishStep } from '../../shared/finishing/readiness';
import type { Plan as PlanDto } from '../../shared/schemas/planner';
import type { SiteData } from '../data/site-data';
import type { JobEntity } from '../db/entities/job.entity';
import type { PartEntity } from '../db/entities/part.entity';
import type { ProductEntity } from '../db/entities/product.entity';
import { systemClock, type Clock } from '../lib/clock';
import { bookedStepsOf, type BookedPartStep } from './booked-steps';
import { currentCoatsByPart, nextCoatStep, stepsByJob } from './part-coats';
import { partsSeenBy } from './part-sites';
import { currentRackLoad, footprintM2, rackCapacityM2 } from './rack-space';
import type { SettingsService } from './settings';

type JobContext = { system: FinishStep[]; products: Map<number, ProductEntity>; now: Date };

function planSteps(system: FinishStep[], products: Map<number, ProductEntity>): PlanStep[] {
  return system.map((step, position): PlanStep => {
    if (step.kind === 'abrade') return { position, kind: 'abrade', grit: step.grit };
    const product = products.get(step.productId)!;
    return { position, kind: 'coat', productName: product.name, dryingTimes: product.dryingTimes };
  });
}

/** Live bookings grouped by session and step, as the planner reads them. */
function groupBooked(booked: BookedPartStep[]): BookedStep[] {
  const groups = new Map<string, BookedStep>();
  for (const b of booked) {
    const key = `${b.sessionId}:${b.stepPosition}`;
    const group = groups.get(key) ?? { stepPosition: b.stepPosition, start: b.start, end: b.end, partIds: [] };
    group.partIds.push(b.partId);
    groups.set(key, group);
  }
  return [...groups.values()];
}

/** The job's parts still to finish that the scope may plan: not collected, and not placed at another site. */
async function plannableParts(data: SiteData, job: JobEntity): Promise<PartEntity[]> {
  const parts = await data.parts.findBy({ jobId: job.id, collectedAt: IsNull() });
  const seen = await partsSeenBy(data, parts);
  return parts.filter((p) => seen.has(p.id));
}

/**
 * A job as it stands: each part's coats on record and the steps live sessions already plan on it.
 * Coats and bookings count wherever they were made (a part's history is one), so a step done or
 * booked at another site is not proposed again.
 */
async function planJobInput(data: SiteData, job: JobEntity, { system, products, now }: JobContext): Promise<PlanJob | null> {
  const parts = await plannableParts(data, job);
  const coats = await currentCoatsByPart(data.acrossSites, parts.map((p) => p.id));
  if (!parts.some((p) => nextCoatStep(system, coats.get(p.id) ?? []) !== null)) return null;
  const booked = await bookedStepsOf(data.acrossSites, parts, { coats, steps: new Map([[job.id, system]]), now });
  const recorded = (p: PartEntity): RecordedCoat[] =>
    (coats.get(p.id) ?? []).flatMap((c) =>
      c.stepPosition === null ? [] : [{ stepPosition: c.stepPosition, recoatOpensAt: new Date(c.recoatOpensAt), recoatClosesAt: c.recoatClosesAt ? new Date(c.recoatClosesAt) : null, packAt: new Date(c.packAt) }],
    );
  return {
    id: job.id,
    reference: job.reference,
    dueDate: job.dueDate,
    steps: planSteps(system, products),
    parts: parts.map((p) => ({ id: p.id, areaM2: p.coatedAreaM2, footprintM2: footprintM2(p), coats: recorded(p) })),
    booked: groupBooked(booked),
  };
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

function toPlanDto(plan: Plan): PlanDto {
  return {
    sessions: plan.sessions.map((s) => ({ ...s, start: s.start.toISOString(), end: s.end.toISOString() })),
    jobs: plan.jobs.map((j) => ({ ...j, finishesAt: iso(j.finishesAt) })),
  };
}

/** Jobs are the group's; the booths, racks and parts planned are those of the caller's site (every site for an admin who names none). */
export function createPlannerService(data: SiteData, settings: SettingsService, clock: Clock = systemClock) {
  /** Everything the auto-planner reads: the jobs as they stand and the booths, bookings and racks of the scope. */
  async function planningInput(jobs: JobEntity[], horizonDays: number): Promise<PlanInput> {
    const now = clock.now();
    const shop = await settings.get();
    const allParts = await data.parts.find({ where: { jobId: In(jobs.map((j) => j.id)) }, select: { id: true, jobId: true } });
    const steps = await stepsByJob(data, allParts);
    const productIds = [...steps.values()].flat().flatMap((s) => (s.kind === 'coat' ? [s.productId] : []));
    const products = new Map((await data.products.findBy({ id: In(productIds) })).map((p) => [p.id, p]));
    const planJobs = (await Promise.all(jobs.map((job) => planJobInput(data, job, { system: steps.get(job.id) ?? [], products, now })))).filter((j): j is PlanJob => j !== null);
    const horizonEnd = new Date(now.getTime() + horizonDays * 86_400_000).toISOString();
    const [booths, rackCapacity, spraySessions, rackLoad] = await Promise.all([
      data.booths.find({ order: { id: 'ASC' } }),
      rackCapacityM2(data),
      data.spraySessions.select('s').where("s.state <> 'cancelled'").andWhere('s.end_at > :now AND s.start_at < :end', { now: now.toISOString(), end: horizonEnd }).getMany(),
      currentRackLoad(data, now),
    ]);
    return {
      now,
      horizonDays,
      timeZone: shop.timezone,
      locale: shop.locale,
      planningTempC: shop.planningDryingTempC,
      setupMin: shop.setupMin,
      cleanDownMin: shop.cleanDownMin,
      abradeMin: 30,
      booths,
      busy: spraySessions.map((s) => ({ boothId: s.boothId, start: new Date(s.startAt), end: new Date(s.endAt) })),
      rackCapacityM2: rackCapacity,
      rackLoad,
      jobs: planJobs,
    };
  }

  return {
    /** A proposal only: nothing is booked until the lead accepts it. */
    async propose(jobIds: number[] | undefined, horizonDays: number): Promise<PlanDto> {
      const jobs = await data.jobs.find({ where: jobIds?.length ? { id: In(jobIds) } : { state: Not(In(['delivered', 'cancelled'])) }, order: { dueDate: 'ASC' } });
      return toPlanDto(autoPlan(await planningInput(jobs, horizonDays)));
    },

    /**
     * Each job planned on its own, as if no other job waited for the booths: its earliest
     * finish. Jobs with nothing left to spray at the scope's site are left out.
     */
    async earliestFinishes(jobs: JobEntity[], horizonDays: number): Promise<Map<number, JobPlan>> {
      const input = await planningInput(jobs, horizonDays);
      return new Map(input.jobs.map((job) => [job.id, autoPlan({ ...input, jobs: [job] }).jobs[0]]));
    },
  };
}

export type PlannerService = ReturnType<typeof createPlannerService>;
