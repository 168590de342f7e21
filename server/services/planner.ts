import { In, IsNull, Not, type DataSource, type EntityManager } from 'typeorm';
import { autoPlan, type BookedStep, type JobPlan, type Plan, type PlanInput, type PlanJob, type PlanStep, type RecordedCoat } from '../../shared/finishing/auto-plan';
import type { FinishStep } from '../../shared/finishing/readiness';
import { BoothEntity } from '../db/entities/booth.entity';
import { everySite, type SiteScope } from '../lib/site-scope';
import { JobEntity } from '../db/entities/job.entity';
import { PartEntity } from '../db/entities/part.entity';
import { ProductEntity } from '../db/entities/product.entity';
import { RackEntity } from '../db/entities/rack.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { systemClock, type Clock } from '../lib/clock';
import { bookedStepsOf, type BookedPartStep } from './booked-steps';
import { currentCoatsByPart, nextCoatStep, stepsByJob } from './part-coats';
import { currentRackLoad, footprintM2 } from './rack-space';
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

/** A job as it stands: each part's coats on record and the steps live sessions already plan on it. */
async function planJobInput(manager: EntityManager, job: JobEntity, { system, products, now }: JobContext): Promise<PlanJob | null> {
  const parts = await manager.findBy(PartEntity, { jobId: job.id, collectedAt: IsNull() });
  const coats = await currentCoatsByPart(manager, parts.map((p) => p.id));
  if (!parts.some((p) => nextCoatStep(system, coats.get(p.id) ?? []) !== null)) return null;
  const booked = await bookedStepsOf(manager, parts, { coats, steps: new Map([[job.id, system]]), now });
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

export function createPlannerService(dataSource: DataSource, settings: SettingsService, clock: Clock = systemClock) {
  /** Everything the auto-planner reads: the jobs as they stand and the booths, bookings and racks of the caller's site. */
  async function planningInput(jobs: JobEntity[], horizonDays: number, scope: SiteScope): Promise<PlanInput> {
    const manager = dataSource.manager;
    const now = clock.now();
    const shop = await settings.get();
    const allParts = await manager.find(PartEntity, { where: { jobId: In(jobs.map((j) => j.id)) }, select: { id: true, jobId: true } });
    const steps = await stepsByJob(manager, allParts as PartEntity[]);
    const productIds = [...steps.values()].flat().flatMap((s) => (s.kind === 'coat' ? [s.productId] : []));
    const products = new Map((await manager.findBy(ProductEntity, { id: In(productIds) })).map((p) => [p.id, p]));
    const planJobs = (await Promise.all(jobs.map((job) => planJobInput(manager, job, { system: steps.get(job.id) ?? [], products, now })))).filter((j): j is PlanJob => j !== null);
    const horizonEnd = new Date(now.getTime() + horizonDays * 86_400_000).toISOString();
    const [booths, racks, sessions, rackLoad] = await Promise.all([
      manager.find(BoothEntity, { where: scope.siteId === null ? {} : { siteId: scope.siteId }, order: { id: 'ASC' } }),
      manager.find(RackEntity, { where: scope.siteId === null ? {} : { siteId: scope.siteId } }),
      manager.createQueryBuilder(SpraySessionEntity, 's').where("s.state <> 'cancelled'").andWhere('s.end_at > :now AND s.start_at < :end', { now: now.toISOString(), end: horizonEnd }).getMany(),
      currentRackLoad(manager, now),
    ]);
    return {
      now,
      horizonDays,
      timeZone: shop.timezone,
      planningTempC: shop.planningDryingTempC,
      setupMin: shop.setupMin,
      cleanDownMin: shop.cleanDownMin,
      abradeMin: 30,
      booths,
      busy: sessions.map((s) => ({ boothId: s.boothId, start: new Date(s.startAt), end: new Date(s.endAt) })),
      rackCapacityM2: racks.reduce((sum, r) => sum + r.shelves * r.shelfAreaM2, 0),
      rackLoad,
      jobs: planJobs,
    };
  }

  return {
    /** Plans into the booths and racks of the caller's site (every site for an admin who names none). */
    async propose(jobIds: number[] | undefined, horizonDays: number, scope: SiteScope = everySite): Promise<Plan> {
      const jobs = await dataSource.manager.find(JobEntity, { where: jobIds?.length ? { id: In(jobIds) } : { state: Not(In(['finished', 'cancelled'])) }, order: { dueDate: 'ASC' } });
      return autoPlan(await planningInput(jobs, horizonDays, scope));
    },

    /**
     * Each job planned on its own, as if no other job waited for the booths: its earliest
     * finish. Jobs with nothing left to spray are left out.
     */
    async earliestFinishes(jobs: JobEntity[], horizonDays: number, scope: SiteScope = everySite): Promise<Map<number, JobPlan>> {
      const input = await planningInput(jobs, horizonDays, scope);
      return new Map(input.jobs.map((job) => [job.id, autoPlan({ ...input, jobs: [job] }).jobs[0]]));
    },
  };
}

export type PlannerService = ReturnType<typeof createPlannerService>;
