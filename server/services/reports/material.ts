import { In } from 'typeorm';
import type { SiteData } from '../../data/site-data';
import type { JobEntity } from '../../db/entities/job.entity';
import type { MaterialQuery, MaterialReport } from '../../../shared/schemas/report';
import type { EstimateService } from '../estimates';
import { shopRange } from './buckets';
import { Statement, inSite, isCurrentCoat, num, round } from './sql';

type UsedRow = { job_id: unknown; product_id: unknown; used_l: unknown };

/**
 * Litres mixed per job and product over the whole job so far. A pot belongs to a session and a
 * product, not to a job, so each session's pots of a product are shared among the jobs its
 * coats of that product covered, in proportion to the coated area.
 */
async function usedLitres(data: SiteData, query: MaterialQuery, timeZone: string): Promise<UsedRow[]> {
  const range = shopRange(query.from, query.to, timeZone);
  const sql = new Statement(data.sql.dialect);
  // Placeholders are written in text order: better-sqlite3 binds `?` by position.
  const jobFilter = () => (query.jobId ? `AND p.job_id = ${sql.param(query.jobId)}` : '');
  const text = `
    WITH jobs_in_range AS (
      SELECT DISTINCT p.job_id FROM coats c JOIN coat_parts cp ON cp.coat_id = c.id JOIN parts p ON p.id = cp.part_id
      WHERE c.sprayed_at >= ${sql.param(range.startsAt)} AND c.sprayed_at < ${sql.param(range.endsAt)} AND ${isCurrentCoat('c')} ${jobFilter()} ${inSite(sql, 'c.spray_session_id', query.siteId)}
    ),
    sessions_of_jobs AS (
      SELECT DISTINCT c.spray_session_id FROM coats c JOIN coat_parts cp ON cp.coat_id = c.id JOIN parts p ON p.id = cp.part_id
      WHERE p.job_id IN (SELECT job_id FROM jobs_in_range) ${inSite(sql, 'c.spray_session_id', query.siteId)}
    ),
    share AS (
      SELECT c.spray_session_id AS sid, c.product_id AS pid, p.job_id AS jid, SUM(p.coated_area_m2) AS area
      FROM coats c JOIN coat_parts cp ON cp.coat_id = c.id JOIN parts p ON p.id = cp.part_id
      WHERE c.spray_session_id IN (SELECT spray_session_id FROM sessions_of_jobs) AND ${isCurrentCoat('c')}
      GROUP BY c.spray_session_id, c.product_id, p.job_id
    ),
    total AS (SELECT sid, pid, SUM(area) AS area FROM share GROUP BY sid, pid),
    mixed AS (
      SELECT m.spray_session_id AS sid, m.product_id AS pid, SUM(m.base_l + m.hardener_l + m.thinner_l) AS litres
      FROM mixes m WHERE m.spray_session_id IN (SELECT spray_session_id FROM sessions_of_jobs)
      GROUP BY m.spray_session_id, m.product_id
    )
    SELECT share.jid AS job_id, share.pid AS product_id, SUM(mixed.litres * share.area / total.area) AS used_l
    FROM share
      JOIN total ON total.sid = share.sid AND total.pid = share.pid
      JOIN mixed ON mixed.sid = share.sid AND mixed.pid = share.pid
    WHERE total.area > 0 AND share.jid IN (SELECT job_id FROM jobs_in_range)
    GROUP BY share.jid, share.pid`;
  return data.sql.query(text, sql.params);
}

async function jobsInRange(data: SiteData, query: MaterialQuery, timeZone: string): Promise<number[]> {
  const range = shopRange(query.from, query.to, timeZone);
  const sql = new Statement(data.sql.dialect);
  const rows: { job_id: unknown }[] = await data.sql.query(
    `SELECT DISTINCT p.job_id FROM coats c JOIN coat_parts cp ON cp.coat_id = c.id JOIN parts p ON p.id = cp.part_id
     WHERE c.sprayed_at >= ${sql.param(range.startsAt)} AND c.sprayed_at < ${sql.param(range.endsAt)} AND ${isCurrentCoat('c')}
     ${query.jobId ? `AND p.job_id = ${sql.param(query.jobId)}` : ''} ${inSite(sql, 'c.spray_session_id', query.siteId)}`,
    sql.params,
  );
  return rows.map((r) => num(r.job_id));
}

/** Ready-to-spray litres per product for one job, from its finish system; none without one. */
async function estimatedLitres(estimates: EstimateService, job: JobEntity): Promise<Map<number, number>> {
  const byProduct = new Map<number, number>();
  if (!job.finishSystemId) return byProduct;
  const estimate = await estimates.forJob(job.id, { method: 'hvlp' });
  for (const step of estimate.steps) byProduct.set(step.productId, (byProduct.get(step.productId) ?? 0) + step.readyToSprayL);
  return byProduct;
}

/** Jobs with a coat in the range, each product's estimate beside the litres mixed for it. */
export async function materialReport(data: SiteData, estimates: EstimateService, query: MaterialQuery, timeZone: string): Promise<MaterialReport> {
  const jobIds = await jobsInRange(data, query, timeZone);
  const used = new Map((await usedLitres(data, query, timeZone)).map((r) => [`${num(r.job_id)}|${num(r.product_id)}`, num(r.used_l)]));
  const jobs = await data.jobs.find({ where: { id: In(jobIds) }, order: { reference: 'ASC' } });
  const cells: { jobId: number; productId: number; estimatedL: number; usedL: number }[] = [];
  for (const job of jobs) {
    const estimated = await estimatedLitres(estimates, job);
    const productIds = new Set([...estimated.keys(), ...[...used.keys()].filter((k) => k.startsWith(`${job.id}|`)).map((k) => Number(k.split('|')[1]))]);
    for (const productId of productIds) cells.push({ jobId: job.id, productId, estimatedL: estimated.get(productId) ?? 0, usedL: used.get(`${job.id}|${productId}`) ?? 0 });
  }
  const products = new Map((await data.products.findBy({ id: In([...new Set(cells.map((c) => c.productId))]) })).map((p) => [p.id, p.name]));
  const jobById = new Map(jobs.map((j) => [j.id, j]));
  const rows = cells.map((c) => ({
    jobId: c.jobId,
    jobReference: jobById.get(c.jobId)!.reference,
    customer: jobById.get(c.jobId)!.customer,
    productId: c.productId,
    productName: products.get(c.productId) ?? '',
    estimatedL: round(c.estimatedL),
    usedL: round(c.usedL),
  }));
  return { from: query.from, to: query.to, timezone: timeZone, siteId: query.siteId ?? null, rows, byProduct: totalsByProduct(rows) };
}

function totalsByProduct(rows: MaterialReport['rows']): MaterialReport['byProduct'] {
  const totals = new Map<number, MaterialReport['byProduct'][number]>();
  for (const r of rows) {
    const t = totals.get(r.productId) ?? { productId: r.productId, productName: r.productName, estimatedL: 0, usedL: 0 };
    totals.set(r.productId, { ...t, estimatedL: round(t.estimatedL + r.estimatedL), usedL: round(t.usedL + r.usedL) });
  }
  return [...totals.values()].sort((a, b) => a.productName.localeCompare(b.productName));
}
