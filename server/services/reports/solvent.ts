import type { SiteData } from '../../data/site-data';
import type { ReportRangeQuery, SolventReport } from '../../../shared/schemas/report';
import { bucketsFor, shopRange } from './buckets';
import { Statement, inSite, num, round } from './sql';

type Row = { month: string; litres: unknown; voc_g: unknown; litres_without_voc: unknown };

/** Litres mixed per shop month, all components, and the VOC they carry (litres × VOC g/L as applied). */
async function monthlyMixes(data: SiteData, from: string, to: string, timeZone: string, siteId: number | undefined): Promise<Map<string, Row>> {
  const sql = new Statement(data.sql.dialect);
  const range = shopRange(from, to, timeZone);
  const litres = '(m.base_l + m.hardener_l + m.thinner_l)';
  const text = `
    WITH ${sql.bucketValues(bucketsFor(from, to, timeZone, 'month'))}
    SELECT b.label AS month, SUM(${litres}) AS litres,
      SUM(CASE WHEN pr.voc_g_per_l IS NULL THEN 0 ELSE ${litres} * pr.voc_g_per_l END) AS voc_g,
      SUM(CASE WHEN pr.voc_g_per_l IS NULL THEN ${litres} ELSE 0 END) AS litres_without_voc
    FROM mixes m
      JOIN b ON m.mixed_at >= b.starts_at AND m.mixed_at < b.ends_at
      JOIN products pr ON pr.id = m.product_id
    WHERE m.mixed_at >= ${sql.param(range.startsAt)} AND m.mixed_at < ${sql.param(range.endsAt)} ${inSite(sql, 'm.spray_session_id', siteId)}
    GROUP BY b.label`;
  const rows: Row[] = await data.sql.query(text, sql.params);
  return new Map(rows.map((r) => [r.month, r]));
}

/**
 * Months of the range with a year-to-date running total that restarts each January, counted
 * from the 1st of January of the range's first year so a range starting mid-year still shows
 * the year's true total.
 */
export async function solventReport(data: SiteData, query: ReportRangeQuery, timeZone: string, thresholdKg: number): Promise<SolventReport> {
  const yearStart = `${query.from.slice(0, 4)}-01-01`;
  const byMonth = await monthlyMixes(data, yearStart, query.to, timeZone, query.siteId);
  const rows: SolventReport['rows'] = [];
  let running = 0;
  for (const { label } of bucketsFor(yearStart, query.to, timeZone, 'month')) {
    if (label.endsWith('-01')) running = 0;
    const row = byMonth.get(label);
    const vocKg = num(row?.voc_g) / 1000;
    running += vocKg;
    if (label < query.from.slice(0, 7)) continue;
    rows.push({ month: label, litres: round(num(row?.litres)), vocKg: round(vocKg, 3), runningTotalKg: round(running, 3), litresWithoutVoc: round(num(row?.litres_without_voc)) });
  }
  return { from: query.from, to: query.to, timezone: timeZone, siteId: query.siteId ?? null, thresholdKg, totalKg: round(rows.reduce((sum, r) => sum + r.vocKg, 0), 3), rows };
}
