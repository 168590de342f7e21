import type { SiteData } from '../../data/site-data';
import type { BoothUseQuery, BoothUseReport } from '../../../shared/schemas/report';
import { bucketsFor, shopRange } from './buckets';
import { Statement, inSiteBooths, isCurrentCoat, num, round } from './sql';

type Row = { week_start: string; booth_id: number; sessions: unknown; booked_hours: unknown; sprayed_hours: unknown };

/**
 * Booked hours are the sessions' slots; sprayed hours run from the checklist letting spraying
 * start (or the first coat) to clearing (or the last coat). Sessions count in the week they start.
 */
export async function boothUseReport(data: SiteData, query: BoothUseQuery, timeZone: string): Promise<BoothUseReport> {
  const buckets = bucketsFor(query.from, query.to, timeZone, 'week');
  const range = shopRange(query.from, query.to, timeZone);
  const sql = new Statement(data.sql.dialect);
  const coatTime = (fn: 'MIN' | 'MAX') => `(SELECT ${fn}(c.sprayed_at) FROM coats c WHERE c.spray_session_id = ss.id AND ${isCurrentCoat('c')})`;
  const text = `
    WITH ${sql.bucketValues(buckets)},
    s AS (
      SELECT ss.booth_id, ss.start_at, ss.end_at,
        COALESCE(ss.spraying_started_at, ${coatTime('MIN')}) AS spray_from,
        COALESCE(ss.clearing_started_at, ${coatTime('MAX')}) AS spray_to
      FROM spray_sessions ss
      WHERE ss.state <> 'cancelled' AND ss.start_at >= ${sql.param(range.startsAt)} AND ss.start_at < ${sql.param(range.endsAt)}
        ${query.boothId ? `AND ss.booth_id = ${sql.param(query.boothId)}` : ''}
        ${inSiteBooths(sql, 'ss.booth_id', query.siteId)}
    )
    SELECT b.label AS week_start, s.booth_id, COUNT(*) AS sessions,
      SUM(${sql.hoursBetween('s.start_at', 's.end_at')}) AS booked_hours,
      SUM(CASE WHEN s.spray_to > s.spray_from THEN ${sql.hoursBetween('s.spray_from', 's.spray_to')} ELSE 0 END) AS sprayed_hours
    FROM s JOIN b ON s.start_at >= b.starts_at AND s.start_at < b.ends_at
    GROUP BY b.label, s.booth_id`;
  const rows: Row[] = await data.sql.query(text, sql.params);
  const booths = await data.booths.find({ where: { ...(query.boothId ? { id: query.boothId } : {}), ...(query.siteId ? { siteId: query.siteId } : {}) }, order: { name: 'ASC' } });
  const found = new Map(rows.map((r) => [`${r.week_start}|${Number(r.booth_id)}`, r]));
  // Every booth gets every week, so an idle week shows as a zero rather than a gap.
  return {
    from: query.from,
    to: query.to,
    timezone: timeZone,
    siteId: query.siteId ?? null,
    rows: buckets.flatMap((bucket) =>
      booths.map((booth) => {
        const row = found.get(`${bucket.label}|${booth.id}`);
        return {
          weekStart: bucket.label,
          boothId: booth.id,
          boothName: booth.name,
          sessions: num(row?.sessions),
          bookedHours: round(num(row?.booked_hours)),
          sprayedHours: round(num(row?.sprayed_hours)),
        };
      }),
    ),
  };
}
