import { In, IsNull } from 'typeorm';
import { groupBy } from '../../shared/group-by';
import { jobReadyTimeOf, partReadyTime, type PartReadyTime } from '../../shared/finishing/job-ready-time';
import type { FinishStep } from '../../shared/finishing/readiness';
import type { ProductDryingTable } from '../../shared/finishing/system-time';
import type { ReadyJob } from '../../shared/schemas/ready';
import type { SiteData } from '../data/site-data';
import { mapInSlices } from '../lib/in-slices';
import type { PartEntity } from '../db/entities/part.entity';
import { bookingsByPart, partFactsOf, type PartFacts } from './readiness-inputs';

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

/** Drying tables of every product the finish systems given name. */
async function dryingTables(data: SiteData, systems: FinishStep[][]): Promise<Map<number, ProductDryingTable>> {
  const ids = [...new Set(systems.flat().flatMap((step) => (step.kind === 'coat' ? [step.productId] : [])))];
  const products = ids.length ? await data.products.findBy({ id: In(ids) }) : [];
  return new Map(products.map((p) => [p.id, { dryingTimes: p.dryingTimes, minApplicationTempC: p.minApplicationTempC }]));
}

export interface ReadyTimes {
  facts: Map<number, PartFacts>;
  times: Map<number, PartReadyTime>;
}

/** Each part's readiness and its expected handle and pack times at the shop's drying temperature. */
export async function readyTimesOf(data: SiteData, parts: PartEntity[], tempC: number, now: Date): Promise<ReadyTimes> {
  const facts = await partFactsOf(data, parts, now);
  const bookings = await bookingsByPart(data, parts.map((p) => p.id));
  const tables = await dryingTables(data, [...facts.values()].map((f) => f.steps));
  const times = new Map(await mapInSlices([...facts], (slice) => slice.map(([id, fact]): [number, PartReadyTime] => [id, partReadyTime({ ...fact.input, bookings: bookings.get(id) }, { tables, tempC })])));
  return { facts, times };
}

/** How many parts of each job have been collected. */
async function collectedCounts(data: SiteData, jobIds: number[]): Promise<Map<number, number>> {
  const rows = await data.parts
    .select('p')
    .select('p.job_id', 'jobId')
    .addSelect('COUNT(*)', 'n')
    .where('p.job_id IN (:...jobIds)', { jobIds })
    .andWhere('p.collected_at IS NOT NULL')
    .groupBy('p.job_id')
    .getRawMany<{ jobId: number; n: number | string }>();
  return new Map(rows.map((row) => [Number(row.jobId), Number(row.n)]));
}

/**
 * Every job's ready-to-handle and ready-to-pack time, from all its parts still on the racks. A job
 * is the group's, so its time counts its parts at every site. Parts whose ready time is `known`
 * already (the board's own) are not worked out again.
 */
export async function readyJobsOf(data: SiteData, jobIds: number[], tempC: number, now: Date, known: Map<number, PartReadyTime> = new Map()): Promise<ReadyJob[]> {
  if (jobIds.length === 0) return [];
  const whole = data.acrossSites;
  const jobs = await whole.jobs.findBy({ id: In(jobIds) });
  const parts = await whole.parts.findBy({ jobId: In(jobIds), collectedAt: IsNull() });
  const collectedByJob = await collectedCounts(whole, jobIds);
  const { times } = await readyTimesOf(whole, parts.filter((p) => !known.has(p.id)), tempC, now);
  const partsByJob = groupBy(parts, (p) => p.jobId, (p) => known.get(p.id) ?? times.get(p.id)!);
  return jobs.map((job) => {
    const time = jobReadyTimeOf(partsByJob.get(job.id) ?? []);
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
