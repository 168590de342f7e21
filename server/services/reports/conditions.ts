import type { SiteData } from '../../data/site-data';
import { conditionMargins } from '../../../shared/finishing/conditions';
import type { ConditionsQuery, ConditionsReport } from '../../../shared/schemas/report';
import { outsideLimitReasons } from '../../../shared/schemas/report';
import { notFound } from '../../lib/app-error';
import { bucketsFor, shopRange, type Bucket } from './buckets';
import { Statement, isCurrentCoat, num, round } from './sql';

const marginC = conditionMargins.stopBelowC;
const hourlyUpToDays = 7;

/** Coats of one booth in the range: current versions only. */
function boothCoats(sql: Statement, boothId: number, range: { startsAt: string; endsAt: string }): string {
  return `SELECT c.* FROM coats c JOIN spray_sessions ss ON ss.id = c.spray_session_id
    WHERE ss.booth_id = ${sql.param(boothId)} AND c.sprayed_at >= ${sql.param(range.startsAt)} AND c.sprayed_at < ${sql.param(range.endsAt)} AND ${isCurrentCoat('c')}`;
}

/** Air, RH and the worst dew-point margin per bucket, from sensor/typed readings and the coats' own records. */
async function conditionPoints(data: SiteData, boothId: number, buckets: Bucket[], range: { startsAt: string; endsAt: string }) {
  const sql = new Statement(data.sql.dialect);
  const text = `
    WITH ${sql.bucketValues(buckets)},
    m AS (
      SELECT r.at, r.air_temp_c, r.relative_humidity_pct, COALESCE(r.surface_temp_c, r.air_temp_c) - r.dew_point_c AS margin
      FROM readings r WHERE r.booth_id = ${sql.param(boothId)} AND r.at >= ${sql.param(range.startsAt)} AND r.at < ${sql.param(range.endsAt)}
      UNION ALL
      SELECT bc.sprayed_at, bc.air_temp_c, bc.relative_humidity_pct, bc.surface_temp_c - bc.dew_point_c FROM (${boothCoats(sql, boothId, range)}) bc
    )
    SELECT b.label AS at, COUNT(*) AS readings, AVG(m.air_temp_c) AS air, AVG(m.relative_humidity_pct) AS rh, MIN(m.margin) AS margin
    FROM m JOIN b ON m.at >= b.starts_at AND m.at < b.ends_at
    GROUP BY b.label ORDER BY b.label`;
  const rows: { at: string; readings: unknown; air: unknown; rh: unknown; margin: unknown }[] = await data.sql.query(text, sql.params);
  return rows.map((r) => ({ at: r.at, readings: num(r.readings), airTempC: round(num(r.air), 1), relativeHumidityPct: round(num(r.rh), 1), dewPointMarginC: round(num(r.margin), 1) }));
}

async function productLimits(data: SiteData, boothId: number, range: { startsAt: string; endsAt: string }) {
  const sql = new Statement(data.sql.dialect);
  const text = `SELECT DISTINCT pr.id, pr.name, pr.min_application_temp_c, pr.max_relative_humidity_pct
    FROM (${boothCoats(sql, boothId, range)}) bc JOIN products pr ON pr.id = bc.product_id ORDER BY pr.name`;
  const rows: { id: unknown; name: string; min_application_temp_c: unknown; max_relative_humidity_pct: unknown }[] = await data.sql.query(text, sql.params);
  const orNull = (v: unknown) => (v === null || v === undefined ? null : num(v));
  return rows.map((r) => ({ productId: num(r.id), productName: r.name, minApplicationTempC: orNull(r.min_application_temp_c), maxRelativeHumidityPct: orNull(r.max_relative_humidity_pct) }));
}

/** The test for each reason, in SQL over a coat `bc` and its product `pr`. */
const reasonTests: Record<(typeof outsideLimitReasons)[number], string> = {
  'air-too-cold': 'pr.min_application_temp_c IS NOT NULL AND bc.air_temp_c < pr.min_application_temp_c',
  'surface-too-cold': 'pr.min_application_temp_c IS NOT NULL AND bc.surface_temp_c < pr.min_application_temp_c',
  'rh-too-high': 'pr.max_relative_humidity_pct IS NOT NULL AND bc.relative_humidity_pct > pr.max_relative_humidity_pct',
  'dew-point-margin': `bc.surface_temp_c - bc.dew_point_c < ${marginC}`,
};

async function coatsOutside(data: SiteData, boothId: number, range: { startsAt: string; endsAt: string }) {
  const sql = new Statement(data.sql.dialect);
  const flags = outsideLimitReasons.map((reason, i) => `CASE WHEN ${reasonTests[reason]} THEN 1 ELSE 0 END AS f${i}`).join(', ');
  const text = `
    SELECT bc.id, bc.sprayed_at, bc.product_id, pr.name, bc.air_temp_c, bc.surface_temp_c, bc.relative_humidity_pct, bc.surface_temp_c - bc.dew_point_c AS margin, ${flags}
    FROM (${boothCoats(sql, boothId, range)}) bc JOIN products pr ON pr.id = bc.product_id
    WHERE ${outsideLimitReasons.map((r) => `(${reasonTests[r]})`).join(' OR ')}
    ORDER BY bc.sprayed_at, bc.id`;
  const rows: Record<string, unknown>[] = await data.sql.query(text, sql.params);
  return rows.map((r) => ({
    coatId: num(r.id),
    sprayedAt: String(r.sprayed_at),
    productId: num(r.product_id),
    productName: String(r.name),
    airTempC: num(r.air_temp_c),
    surfaceTempC: num(r.surface_temp_c),
    relativeHumidityPct: num(r.relative_humidity_pct),
    dewPointMarginC: round(num(r.margin), 1),
    reasons: outsideLimitReasons.filter((_, i) => num(r[`f${i}`]) === 1),
  }));
}

async function coatCount(data: SiteData, boothId: number, range: { startsAt: string; endsAt: string }): Promise<number> {
  const sql = new Statement(data.sql.dialect);
  const [row]: { n: unknown }[] = await data.sql.query(`SELECT COUNT(*) AS n FROM (${boothCoats(sql, boothId, range)}) bc`, sql.params);
  return num(row?.n);
}

/** Hourly for a week or less, else per shop day. */
export async function conditionsReport(data: SiteData, query: ConditionsQuery, timeZone: string): Promise<ConditionsReport> {
  const booth = await data.booths.findOneBy({ id: query.boothId });
  if (!booth || (query.siteId !== undefined && booth.siteId !== query.siteId)) throw notFound('Booth');
  const range = shopRange(query.from, query.to, timeZone);
  const days = (Date.parse(query.to) - Date.parse(query.from)) / 86_400_000 + 1;
  const bucket = days <= hourlyUpToDays ? 'hour' : 'day';
  const buckets = bucketsFor(query.from, query.to, timeZone, bucket);
  return {
    from: query.from,
    to: query.to,
    timezone: timeZone,
    siteId: query.siteId ?? null,
    boothId: booth.id,
    boothName: booth.name,
    bucket,
    points: await conditionPoints(data, booth.id, buckets, range),
    limits: await productLimits(data, booth.id, range),
    minDewPointMarginC: marginC,
    coatCount: await coatCount(data, booth.id, range),
    coatsOutside: await coatsOutside(data, booth.id, range),
  };
}

