import type { ReportRangeQuery, UpkeepReport } from '../../../shared/schemas/report';
import type { SiteData } from '../../data/site-data';
import { shopRange } from './buckets';
import { Statement, num } from './sql';

type Row = UpkeepReport['rows'][number];
type Counted = { key: unknown; n: unknown };

/** A dated upkeep table: its date column, what groups it (the booth, or the person), and what else a record must share to supersede another. */
interface Dated {
  table: 'extraction_tests' | 'fire_inspections' | 'crew_records';
  date: 'tested_on' | 'inspected_on' | 'done_on';
  group: 'booth_id' | 'user_id';
  /** Extra condition on `t` (the record) and `n` (the one that supersedes it). */
  same?: string;
  where?: string;
}

const siteOf = (sql: Statement, d: Dated, alias: string, siteId: number | undefined) =>
  siteId === undefined ? '' : `AND ${alias}.${d.group} IN (SELECT s.id FROM ${d.group === 'booth_id' ? 'booths' : 'users'} s WHERE s.site_id = ${sql.param(siteId)})`;

/**
 * Done: records dated in the range. Due: records whose next-due date falls in it; done by the due
 * date when a later record of the same booth (or person and kind) is dated after it and no later
 * than that date. Dates are shop calendar dates, so the range is compared as text.
 */
async function dueAndDone(data: SiteData, d: Dated, query: ReportRangeQuery): Promise<{ done: Map<number, number>; due: Map<number, number>; onTime: Map<number, number> }> {
  const extra = (alias: string) => (d.where ? `AND ${d.where.replaceAll('{t}', alias)}` : '');
  const done = new Statement(data.sql.dialect);
  const doneRows: Counted[] = await data.sql.query(
    `SELECT t.${d.group} AS key, COUNT(*) AS n FROM ${d.table} t WHERE t.${d.date} >= ${done.param(query.from)} AND t.${d.date} <= ${done.param(query.to)} ${extra('t')} ${siteOf(done, d, 't', query.siteId)} GROUP BY t.${d.group}`,
    done.params,
  );
  const due = new Statement(data.sql.dialect);
  const superseded = `EXISTS (SELECT 1 FROM ${d.table} n WHERE n.${d.group} = t.${d.group} ${d.same ?? ''} AND (n.${d.date} > t.${d.date} OR (n.${d.date} = t.${d.date} AND n.id > t.id)) AND n.${d.date} <= t.next_due_on)`;
  const dueRows: (Counted & { on_time: unknown })[] = await data.sql.query(
    `SELECT t.${d.group} AS key, COUNT(*) AS n, SUM(CASE WHEN ${superseded} THEN 1 ELSE 0 END) AS on_time FROM ${d.table} t
     WHERE t.next_due_on >= ${due.param(query.from)} AND t.next_due_on <= ${due.param(query.to)} ${extra('t')} ${siteOf(due, d, 't', query.siteId)} GROUP BY t.${d.group}`,
    due.params,
  );
  return {
    done: new Map(doneRows.map((r) => [num(r.key), num(r.n)])),
    due: new Map(dueRows.map((r) => [num(r.key), num(r.n)])),
    onTime: new Map(dueRows.map((r) => [num(r.key), num(r.on_time)])),
  };
}

async function filterChanges(data: SiteData, query: ReportRangeQuery, timeZone: string): Promise<Map<number, number>> {
  const range = shopRange(query.from, query.to, timeZone);
  const sql = new Statement(data.sql.dialect);
  const site = query.siteId === undefined ? '' : `AND c.booth_id IN (SELECT s.id FROM booths s WHERE s.site_id = ${sql.param(query.siteId)})`;
  const text = `SELECT c.booth_id AS key, COUNT(*) AS n FROM filter_changes c WHERE 1 = 1 ${site} AND c.changed_at >= ${sql.param(range.startsAt)} AND c.changed_at < ${sql.param(range.endsAt)} GROUP BY c.booth_id`;
  const rows: Counted[] = await data.sql.query(text, sql.params);
  return new Map(rows.map((r) => [num(r.key), num(r.n)]));
}

const boothTables: [Row['kind'], Dated][] = [
  ['extraction-test', { table: 'extraction_tests', date: 'tested_on', group: 'booth_id' }],
  ['fire-inspection', { table: 'fire_inspections', date: 'inspected_on', group: 'booth_id' }],
];
const crewKinds: Row['kind'][] = ['fit-test', 'health-surveillance', 'training'];
const crewTable = (kind: Row['kind']): Dated => ({
  table: 'crew_records',
  date: 'done_on',
  group: 'user_id',
  where: `{t}.kind = '${kind}'`,
  // A training is renewed by the same training; a fit test or surveillance by the next of its kind.
  same: kind === 'training' ? "AND n.kind = t.kind AND LOWER(n.title) = LOWER(t.title)" : 'AND n.kind = t.kind',
});
const sum = (m: Map<number, number>) => [...m.values()].reduce((a, b) => a + b, 0);

/** Upkeep done against upkeep due, per booth and kind, and the site's crew records together (counts only, never names). */
export async function upkeepReport(data: SiteData, query: ReportRangeQuery, timeZone: string): Promise<UpkeepReport> {
  const booths = await data.booths.find({ where: query.siteId === undefined ? {} : { siteId: query.siteId }, order: { name: 'ASC', id: 'ASC' } });
  const changes = await filterChanges(data, query, timeZone);
  const dated = await Promise.all(boothTables.map(async ([kind, table]) => [kind, await dueAndDone(data, table, query)] as const));
  const rows: Row[] = [];
  for (const booth of booths) {
    rows.push({ boothId: booth.id, boothName: booth.name, kind: 'filter-change', done: changes.get(booth.id) ?? 0, due: null, doneByDue: null });
    for (const [kind, counts] of dated) rows.push({ boothId: booth.id, boothName: booth.name, kind, done: counts.done.get(booth.id) ?? 0, due: counts.due.get(booth.id) ?? 0, doneByDue: counts.onTime.get(booth.id) ?? 0 });
  }
  for (const kind of crewKinds) {
    const counts = await dueAndDone(data, crewTable(kind), query);
    rows.push({ boothId: null, boothName: null, kind, done: sum(counts.done), due: sum(counts.due), doneByDue: sum(counts.onTime) });
  }
  return { from: query.from, to: query.to, timezone: timeZone, siteId: query.siteId ?? null, rows };
}
