import type { SiteData } from '../../data/site-data';
import type { AreaSprayedQuery, AreaSprayedReport } from '../../../shared/schemas/report';
import { bucketsFor, shopRange } from './buckets';
import { Statement, inSite, isCurrentCoat, num, round } from './sql';

type Row = { week_start: string; group_key: unknown; group_label: string; coats: unknown; area_m2: unknown };

const grouping = {
  'product-kind': { join: 'JOIN products pr ON pr.id = cur.product_id', key: 'pr.kind', label: 'pr.kind' },
  job: { join: 'JOIN jobs j ON j.id = p.job_id', key: 'j.id', label: "j.reference || ' ' || j.customer" },
} as const;

/** Coated area of every part each current coat covered, per week of the shop's calendar. */
export async function areaSprayedReport(data: SiteData, query: AreaSprayedQuery, timeZone: string): Promise<AreaSprayedReport> {
  const buckets = bucketsFor(query.from, query.to, timeZone, 'week');
  const range = shopRange(query.from, query.to, timeZone);
  const sql = new Statement(data.sql.dialect);
  const group = grouping[query.groupBy];
  const text = `
    WITH ${sql.bucketValues(buckets)},
    cur AS (
      SELECT c.id, c.sprayed_at, c.product_id FROM coats c
      WHERE c.sprayed_at >= ${sql.param(range.startsAt)} AND c.sprayed_at < ${sql.param(range.endsAt)} AND ${isCurrentCoat('c')} ${inSite(sql, 'c.spray_session_id', query.siteId)}
    )
    SELECT b.label AS week_start, ${group.key} AS group_key, ${group.label} AS group_label,
      COUNT(DISTINCT cur.id) AS coats, SUM(p.coated_area_m2) AS area_m2
    FROM cur
      JOIN b ON cur.sprayed_at >= b.starts_at AND cur.sprayed_at < b.ends_at
      JOIN coat_parts cp ON cp.coat_id = cur.id
      JOIN parts p ON p.id = cp.part_id
      ${group.join}
    GROUP BY b.label, ${group.key}, ${group.label}
    ORDER BY b.label, ${group.label}`;
  const rows: Row[] = await data.sql.query(text, sql.params);
  return {
    from: query.from,
    to: query.to,
    timezone: timeZone,
    siteId: query.siteId ?? null,
    groupBy: query.groupBy,
    rows: rows.map((r) => ({ weekStart: r.week_start, key: String(r.group_key), label: r.group_label, coats: num(r.coats), areaM2: round(num(r.area_m2)) })),
  };
}
