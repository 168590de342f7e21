import Database from 'better-sqlite3';
import type { ShopRefs } from './base-shop';
import { dayRows } from './day-rows';
import { jobRows, type Row } from './job-rows';
import type { Timeline } from './timeline';

const columns = {
  jobs: 'id, customer, reference, due_date, finish_system_id, colour, sheen, notes, state, created_at, updated_at',
  parts: 'id, job_id, label, kind, length_mm, width_mm, thickness_mm, quantity, faces, edges, coated_area_m2, rack_id, shelf, tag, state, collected_at, created_at, updated_at',
  spray_sessions: 'id, booth_id, start_at, end_at, sprayer_id, state, notes, checklist, override_reason, spraying_started_at, clearing_started_at, created_at, updated_at',
  spray_session_items: 'id, spray_session_id, part_id, step_position',
  coats:
    'id, spray_session_id, product_id, lot_id, step_position, mix_id, sprayed_at, air_temp_c, relative_humidity_pct, surface_temp_c, dew_point_c, thinning_pct, wet_film_um, dry_film_um, drying_temp_c, drying_method, ' +
    'flash_off_ends_at, recoat_opens_at, recoat_closes_at, touch_dry_at, handle_at, pack_at, full_cure_at, warnings, notes, version, replaces_id, correction_reason, recorded_by_id, recorded_by_name, recorded_at, idempotency_key',
  coat_parts: 'coat_id, part_id',
  readings: 'id, booth_id, rack_id, at, air_temp_c, relative_humidity_pct, surface_temp_c, dew_point_c, source, recorded_by_id',
} as const;
type Table = keyof typeof columns;

export type RowCounts = Record<Table, number>;
const daysPerTransaction = 20;

function openForBulk(databasePath: string) {
  const db = new Database(databasePath);
  // The app's own settings, except that a bulk load need not wait for the disk after each commit.
  db.pragma('journal_mode = WAL');
  db.pragma('foreign_keys = ON');
  db.pragma('synchronous = OFF');
  db.pragma('cache_size = -262144');
  const statements = Object.fromEntries(
    (Object.keys(columns) as Table[]).map((table) => [table, db.prepare(`INSERT INTO ${table} (${columns[table]}) VALUES (${columns[table].split(',').map(() => '?').join(', ')})`)]),
  ) as Record<Table, Database.Statement>;
  return { db, statements };
}

/**
 * Writes the jobs started on the working days `days.jobs` and the work done on the days
 * `days.work` straight into the database file, in big transactions with prepared statements. Only inserts: the append-only triggers stay on,
 * and so does the no-overlap trigger, which is why sessions go in newest first (each check then
 * finds nothing after it in the booth's index instead of scanning all earlier sessions).
 */
export function insertVolume(databasePath: string, timeline: Timeline, refs: ShopRefs, days: { jobs: [number, number]; work: [number, number] }): RowCounts {
  const { db, statements } = openForBulk(databasePath);
  const counts = Object.fromEntries(Object.keys(columns).map((t) => [t, 0])) as RowCounts;
  const insert = (table: Table, rows: Row[]) => {
    for (const row of rows) statements[table].run(row);
    counts[table] += rows.length;
  };
  try {
    const jobsPerDay = refs.systems.length;
    db.transaction(() => {
      for (let seq = days.jobs[0] * jobsPerDay; seq < (days.jobs[1] + 1) * jobsPerDay; seq += 1) {
        const { job, parts } = jobRows(seq, timeline, refs);
        insert('jobs', [job]);
        insert('parts', parts);
      }
    })();
    const [from, to] = days.work;
    // Newest day first; each day's rows are made just before they go in, so little is held at once.
    const insertDays = db.transaction((first: number, last: number) => {
      for (let day = last; day >= first; day -= 1) {
        const rows = dayRows(day, timeline, refs);
        insert('spray_sessions', rows.sessions.sort((a, b) => String(b[2]).localeCompare(String(a[2]))));
        insert('spray_session_items', rows.items);
        insert('coats', rows.coats);
        insert('coat_parts', rows.coatParts);
        insert('readings', rows.readings);
      }
    });
    for (let last = to; last >= from; last -= daysPerTransaction) insertDays(Math.max(from, last - daysPerTransaction + 1), last);
    db.pragma('wal_checkpoint(TRUNCATE)');
  } finally {
    db.close();
  }
  return counts;
}
