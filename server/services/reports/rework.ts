import type { SiteData } from '../../data/site-data';
import type { ReportRangeQuery, ReworkReport } from '../../../shared/schemas/report';
import { bucketsFor, shopRange } from './buckets';
import { Statement, inSite, isCurrentCoat, num } from './sql';

type Row = { month: string; kind: 'corrected' | 'repeated'; reason: string; n: unknown };

/**
 * Corrected: correction versions, by the reason typed (trimmed, lower case). Repeated: current
 * coats of a step that one of their parts already had from an earlier current coat, or that the
 * sprayer marked as a re-spray, by the reason given.
 */
export async function reworkReport(data: SiteData, query: ReportRangeQuery, timeZone: string): Promise<ReworkReport> {
  const range = shopRange(query.from, query.to, timeZone);
  const sql = new Statement(data.sql.dialect);
  const buckets = sql.bucketValues(bucketsFor(query.from, query.to, timeZone, 'month'));
  const inRange = (alias: string) => `${alias}.sprayed_at >= ${sql.param(range.startsAt)} AND ${alias}.sprayed_at < ${sql.param(range.endsAt)} ${inSite(sql, `${alias}.spray_session_id`, query.siteId)}`;
  const sprayedBefore = `EXISTS (
    SELECT 1 FROM coat_parts cp JOIN coat_parts cp2 ON cp2.part_id = cp.part_id AND cp2.coat_id <> cp.coat_id JOIN coats c2 ON c2.id = cp2.coat_id
    WHERE cp.coat_id = c.id AND c2.step_position = c.step_position AND c2.sprayed_at < c.sprayed_at AND ${isCurrentCoat('c2')})`;
  const text = `
    WITH ${buckets},
    r AS (
      SELECT c.sprayed_at, 'corrected' AS kind, LOWER(TRIM(c.correction_reason)) AS reason FROM coats c
      WHERE c.replaces_id IS NOT NULL AND ${inRange('c')}
      UNION ALL
      SELECT c.sprayed_at, 'repeated', COALESCE(c.rework_reason, 'not-given') FROM coats c
      WHERE ${inRange('c')} AND ${isCurrentCoat('c')} AND (c.rework_reason IS NOT NULL OR (c.step_position IS NOT NULL AND ${sprayedBefore}))
    )
    SELECT b.label AS month, r.kind, r.reason, COUNT(*) AS n
    FROM r JOIN b ON r.sprayed_at >= b.starts_at AND r.sprayed_at < b.ends_at
    GROUP BY b.label, r.kind, r.reason
    ORDER BY b.label, r.kind, r.reason`;
  const rows: Row[] = await data.sql.query(text, sql.params);
  const count = new Statement(sql.dialect);
  const [total]: { n: unknown }[] = await data.sql.query(
    `SELECT COUNT(*) AS n FROM coats c WHERE c.sprayed_at >= ${count.param(range.startsAt)} AND c.sprayed_at < ${count.param(range.endsAt)} AND ${isCurrentCoat('c')} ${inSite(count, 'c.spray_session_id', query.siteId)}`,
    count.params,
  );
  return { from: query.from, to: query.to, timezone: timeZone, siteId: query.siteId ?? null, coatCount: num(total?.n), rows: rows.map((r) => ({ month: r.month, kind: r.kind, reason: r.reason, count: num(r.n) })) };
}
