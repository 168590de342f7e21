import { In, IsNull, Not } from 'typeorm';
import { autoPlan, type Plan, type PlanJob, type PlanStep } from '../../shared/finishing/auto-plan';
import type { Plan as PlanDto } from '../../shared/schemas/planner';
import type { FinishStep } from '../../shared/finishing/readiness';
import type { SiteData } from '../data/site-data';
import type { JobEntity } from '../db/entities/job.entity';
import type { PartEntity } from '../db/entities/part.entity';
import type { ProductEntity } from '../db/entities/product.entity';
import { systemClock, type Clock } from '../lib/clock';
import { currentCoatsByPart, nextCoatStep, stepsByJob } from './part-coats';
import { partsSeenBy } from './part-sites';
import { currentRackLoad, footprintM2, rackCapacityM2 } from './rack-space';
import type { SettingsService } from './settings';

/** The job's parts still to finish that the scope may plan: not collected, and not placed at another site. */
async function plannableParts(data: SiteData, job: JobEntity): Promise<PartEntity[]> {
  const parts = await data.parts.findBy({ jobId: job.id, collectedAt: IsNull() });
  const seen = await partsSeenBy(data, parts);
  return parts.filter((p) => seen.has(p.id));
}

/** One job's remaining steps, planned from its least advanced part (the whole batch moves together). */
async function planJobInput(data: SiteData, job: JobEntity, system: FinishStep[], products: Map<number, ProductEntity>): Promise<PlanJob | null> {
  const parts = await plannableParts(data, job);
  const coats = await currentCoatsByPart(data.acrossSites, parts.map((p) => p.id));
  const open = parts.filter((p) => nextCoatStep(system, coats.get(p.id) ?? []) !== null);
  if (open.length === 0) return null;
  const lastDone = (p: PartEntity) => Math.max(-1, ...(coats.get(p.id) ?? []).map((c) => c.stepPosition ?? -1));
  const laggard = open.reduce((a, b) => (lastDone(b) < lastDone(a) ? b : a));
  const latest = [...(coats.get(laggard.id) ?? [])].sort((a, b) => b.sprayedAt.localeCompare(a.sprayedAt))[0];
  const remaining = system.slice(lastDone(laggard) + 1).map((step, i): PlanStep => {
    const position = lastDone(laggard) + 1 + i;
    if (step.kind === 'abrade') return { position, kind: 'abrade', grit: step.grit };
    const product = products.get(step.productId)!;
    return { position, kind: 'coat', productName: product.name, dryingTimes: product.dryingTimes };
  });
  return {
    id: job.id,
    reference: job.reference,
    dueDate: job.dueDate,
    partIds: open.map((p) => p.id),
    areaM2: open.reduce((sum, p) => sum + p.coatedAreaM2, 0),
    footprintM2: open.reduce((sum, p) => sum + footprintM2(p), 0),
    remaining,
    lastWindow: latest ? { opensAt: new Date(latest.recoatOpensAt), closesAt: latest.recoatClosesAt ? new Date(latest.recoatClosesAt) : null } : null,
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
  return {
    /** A proposal only: nothing is booked until the lead accepts it. */
    async propose(jobIds: number[] | undefined, horizonDays: number): Promise<PlanDto> {
      const now = clock.now();
      const shop = await settings.get();
      const jobs = await data.jobs.find({ where: jobIds?.length ? { id: In(jobIds) } : { state: Not(In(['delivered', 'cancelled'])) }, order: { dueDate: 'ASC' } });
      const allParts = await data.parts.find({ where: { jobId: In(jobs.map((j) => j.id)) }, select: { id: true, jobId: true } });
      const steps = await stepsByJob(data, allParts);
      const productIds = [...steps.values()].flat().flatMap((s) => (s.kind === 'coat' ? [s.productId] : []));
      const products = new Map((await data.products.findBy({ id: In(productIds) })).map((p) => [p.id, p]));
      const planJobs = (await Promise.all(jobs.map((job) => planJobInput(data, job, steps.get(job.id) ?? [], products)))).filter((j): j is PlanJob => j !== null);
      const horizonEnd = new Date(now.getTime() + horizonDays * 86_400_000).toISOString();
      const [booths, rackCapacity, spraySessions, rackLoad] = await Promise.all([
        data.booths.find({ order: { id: 'ASC' } }),
        rackCapacityM2(data),
        data.spraySessions.select('s').where("s.state <> 'cancelled'").andWhere('s.end_at > :now AND s.start_at < :end', { now: now.toISOString(), end: horizonEnd }).getMany(),
        currentRackLoad(data, now),
      ]);
      const plan = autoPlan({
        now,
        horizonDays,
        timeZone: shop.timezone,
        planningTempC: shop.planningDryingTempC,
        setupMin: shop.setupMin,
        cleanDownMin: shop.cleanDownMin,
        abradeMin: 30,
        booths,
        busy: spraySessions.map((s) => ({ boothId: s.boothId, start: new Date(s.startAt), end: new Date(s.endAt) })),
        rackCapacityM2: rackCapacity,
        rackLoad,
        jobs: planJobs,
      });
      return toPlanDto(plan);
    },
  };
}

export type PlannerService = ReturnType<typeof createPlannerService>;
