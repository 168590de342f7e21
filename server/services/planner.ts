import { In, IsNull, Not, type DataSource, type EntityManager } from 'typeorm';
import { autoPlan, type Plan, type PlanJob, type PlanStep } from '../../shared/finishing/auto-plan';
import type { FinishStep } from '../../shared/finishing/readiness';
import { BoothEntity } from '../db/entities/booth.entity';
import { everySite, type SiteScope } from '../lib/site-scope';
import { JobEntity } from '../db/entities/job.entity';
import { PartEntity } from '../db/entities/part.entity';
import { ProductEntity } from '../db/entities/product.entity';
import { RackEntity } from '../db/entities/rack.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { systemClock, type Clock } from '../lib/clock';
import { currentCoatsByPart, nextCoatStep, stepsByJob } from './part-coats';
import { currentRackLoad, footprintM2 } from './rack-space';
import type { SettingsService } from './settings';


/** One job's remaining steps, planned from its least advanced part (the whole batch moves together). */
async function planJobInput(manager: EntityManager, job: JobEntity, system: FinishStep[], products: Map<number, ProductEntity>): Promise<PlanJob | null> {
  const parts = await manager.findBy(PartEntity, { jobId: job.id, collectedAt: IsNull() });
  const coats = await currentCoatsByPart(manager, parts.map((p) => p.id));
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

export function createPlannerService(dataSource: DataSource, settings: SettingsService, clock: Clock = systemClock) {
  return {
    /** Plans into the booths and racks of the caller's site (every site for an admin who names none). */
    async propose(jobIds: number[] | undefined, horizonDays: number, scope: SiteScope = everySite): Promise<Plan> {
      const manager = dataSource.manager;
      const now = clock.now();
      const shop = await settings.get();
      const jobs = await manager.find(JobEntity, { where: jobIds?.length ? { id: In(jobIds) } : { state: Not(In(['delivered', 'cancelled'])) }, order: { dueDate: 'ASC' } });
      const allParts = await manager.find(PartEntity, { where: { jobId: In(jobs.map((j) => j.id)) }, select: { id: true, jobId: true } });
      const steps = await stepsByJob(manager, allParts as PartEntity[]);
      const productIds = [...steps.values()].flat().flatMap((s) => (s.kind === 'coat' ? [s.productId] : []));
      const products = new Map((await manager.findBy(ProductEntity, { id: In(productIds) })).map((p) => [p.id, p]));
      const planJobs = (await Promise.all(jobs.map((job) => planJobInput(manager, job, steps.get(job.id) ?? [], products)))).filter((j): j is PlanJob => j !== null);
      const horizonEnd = new Date(now.getTime() + horizonDays * 86_400_000).toISOString();
      const [booths, racks, sessions, rackLoad] = await Promise.all([
        manager.find(BoothEntity, { where: scope.siteId === null ? {} : { siteId: scope.siteId }, order: { id: 'ASC' } }),
        manager.find(RackEntity, { where: scope.siteId === null ? {} : { siteId: scope.siteId } }),
        manager.createQueryBuilder(SpraySessionEntity, 's').where("s.state <> 'cancelled'").andWhere('s.end_at > :now AND s.start_at < :end', { now: now.toISOString(), end: horizonEnd }).getMany(),
        currentRackLoad(manager, now),
      ]);
      return autoPlan({
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
      });
    },
  };
}

export type PlannerService = ReturnType<typeof createPlannerService>;
