import { In, IsNull, type EntityManager } from 'typeorm';
import { jobReadyTime, partReadyTime, type PartReadyTime } from '../../shared/finishing/job-ready-time';
import type { FinishStep } from '../../shared/finishing/readiness';
import type { ProductDryingTable } from '../../shared/finishing/system-time';
import type { ReadyJob } from '../../shared/schemas/ready';
import { JobEntity } from '../db/entities/job.entity';
import { PartEntity } from '../db/entities/part.entity';
import { ProductEntity } from '../db/entities/product.entity';
import { bookingsByPart, partFactsOf, type PartFacts } from './readiness-inputs';

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

/** Drying tables of every product the finish systems given name. */
async function dryingTables(manager: EntityManager, systems: FinishStep[][]): Promise<Map<number, ProductDryingTable>> {
  const ids = [...new Set(systems.flat().flatMap((step) => (step.kind === 'coat' ? [step.productId] : [])))];
  const products = ids.length ? await manager.findBy(ProductEntity, { id: In(ids) }) : [];
  return new Map(products.map((p) => [p.id, { dryingTimes: p.dryingTimes, minApplicationTempC: p.minApplicationTempC }]));
}

export interface ReadyTimes {
  facts: Map<number, PartFacts>;
  times: Map<number, PartReadyTime>;
}

/** Each part's readiness and its expected handle and pack times at the shop's drying temperature. */
export async function readyTimesOf(manager: EntityManager, parts: PartEntity[], tempC: number, now: Date): Promise<ReadyTimes> {
  const [facts, bookings] = await Promise.all([partFactsOf(manager, parts, now), bookingsByPart(manager, parts.map((p) => p.id))]);
  const tables = await dryingTables(manager, [...facts.values()].map((f) => f.steps));
  const times = new Map([...facts].map(([id, fact]) => [id, partReadyTime({ ...fact.input, bookings: bookings.get(id) }, { tables, tempC })]));
  return { facts, times };
}

/** Every job's ready-to-handle and ready-to-pack time, from all its parts still on the racks. */
export async function readyJobsOf(manager: EntityManager, jobIds: number[], tempC: number, now: Date): Promise<ReadyJob[]> {
  if (jobIds.length === 0) return [];
  const [jobs, parts, collected] = await Promise.all([
    manager.findBy(JobEntity, { id: In(jobIds) }),
    manager.findBy(PartEntity, { jobId: In(jobIds), collectedAt: IsNull() }),
    manager.createQueryBuilder(PartEntity, 'p').select('p.job_id', 'jobId').addSelect('COUNT(*)', 'n').where('p.job_id IN (:...jobIds)', { jobIds }).andWhere('p.collected_at IS NOT NULL').groupBy('p.job_id').getRawMany<{ jobId: number; n: number | string }>(),
  ]);
  const [facts, bookings] = await Promise.all([partFactsOf(manager, parts, now), bookingsByPart(manager, parts.map((p) => p.id))]);
  const tables = await dryingTables(manager, [...facts.values()].map((f) => f.steps));
  const collectedByJob = new Map(collected.map((row) => [Number(row.jobId), Number(row.n)]));
  return jobs.map((job) => {
    const own = parts.filter((p) => p.jobId === job.id);
    const time = jobReadyTime(own.map((p) => ({ ...facts.get(p.id)!.input, bookings: bookings.get(p.id) })), { tables, tempC });
    return {
      jobId: job.id,
      jobReference: job.reference,
      handleAt: iso(time.handleAt),
      packAt: iso(time.packAt),
      coatsRemaining: time.coatsRemaining,
      partsCounted: time.partsCounted,
      partsCollected: collectedByJob.get(job.id) ?? 0,
      partsUnknown: time.partsUnknown,
      projected: time.projected,
      dryingTempC: tempC,
    };
  });
}
