// The record's last line of defence against hand-written SQL on the database file or server.
// Update and delete triggers alone leave gaps: SQLite's INSERT OR REPLACE deletes the row it
// collides with without firing delete triggers (unless recursive triggers are on, which a
// sqlite3 shell never sets), and PostgreSQL's TRUNCATE skips row triggers. So every append-only
// table also refuses an insert that would take an existing row's place, and TRUNCATE.

/** Append-only tables and what makes an inserted row collide with one already there. */
const collisions: Record<string, string> = {
  coats: 'r.id = NEW.id OR r.idempotency_key = NEW.idempotency_key OR r.replaces_id = NEW.replaces_id',
  coat_parts: 'r.coat_id = NEW.coat_id AND r.part_id = NEW.part_id',
  mixes: 'r.id = NEW.id',
  denibs: 'r.id = NEW.id',
  denib_parts: 'r.denib_id = NEW.denib_id AND r.part_id = NEW.part_id',
  readings: 'r.id = NEW.id',
  audit_entries: 'r.id = NEW.id',
};
export const appendOnlyTables = Object.keys(collisions);
/** Tables that had no update or delete guard before (coats, coat_parts, mixes, denibs and denib_parts had). */
const newlyGuarded = ['readings', 'audit_entries'];

const replaceMessage = 'append_only: a record is never replaced; add a new one (a correction for a coat)';
const changeMessage = 'append_only: this record is never changed or deleted';

export const sqliteRecordGuards = {
  up: [
    ...appendOnlyTables.map(
      (table) => `CREATE TRIGGER ${table}_no_replace BEFORE INSERT ON ${table}
       WHEN EXISTS (SELECT 1 FROM ${table} r WHERE ${collisions[table]})
       BEGIN SELECT RAISE(ABORT, '${replaceMessage}'); END`,
    ),
    ...newlyGuarded.flatMap((table) => [
      `CREATE TRIGGER ${table}_no_update BEFORE UPDATE ON ${table} BEGIN SELECT RAISE(ABORT, '${changeMessage}'); END`,
      `CREATE TRIGGER ${table}_no_delete BEFORE DELETE ON ${table} BEGIN SELECT RAISE(ABORT, '${changeMessage}'); END`,
    ]),
  ],
  down: [...appendOnlyTables.map((table) => `DROP TRIGGER ${table}_no_replace`), ...newlyGuarded.flatMap((table) => [`DROP TRIGGER ${table}_no_update`, `DROP TRIGGER ${table}_no_delete`])],
};

// PostgreSQL's unique indexes already refuse a colliding insert and ON CONFLICT DO UPDATE fires
// the update guard; the insert trigger says why in the record's own words, and holds even if an
// index were dropped. One function per table: plpgsql cannot name NEW's table generically here.
const postgresNoReplace = (table: string) => [
  `CREATE FUNCTION boothwright_${table}_no_replace() RETURNS trigger LANGUAGE plpgsql AS $$
   BEGIN
     IF EXISTS (SELECT 1 FROM ${table} r WHERE ${collisions[table]}) THEN RAISE EXCEPTION '${replaceMessage}'; END IF;
     RETURN NEW;
   END $$`,
  `CREATE TRIGGER ${table}_no_replace BEFORE INSERT ON ${table} FOR EACH ROW EXECUTE FUNCTION boothwright_${table}_no_replace()`,
  `CREATE TRIGGER ${table}_no_truncate BEFORE TRUNCATE ON ${table} FOR EACH STATEMENT EXECUTE FUNCTION boothwright_record_only()`,
];

export const postgresRecordGuards = {
  up: [
    `CREATE FUNCTION boothwright_record_only() RETURNS trigger LANGUAGE plpgsql AS $$
     BEGIN RAISE EXCEPTION '${changeMessage}'; END $$`,
    ...appendOnlyTables.flatMap(postgresNoReplace),
    ...newlyGuarded.map((table) => `CREATE TRIGGER ${table}_append_only BEFORE UPDATE OR DELETE ON ${table} FOR EACH ROW EXECUTE FUNCTION boothwright_record_only()`),
  ],
  down: [
    ...newlyGuarded.map((table) => `DROP TRIGGER ${table}_append_only ON ${table}`),
    ...appendOnlyTables.flatMap((table) => [`DROP TRIGGER ${table}_no_truncate ON ${table}`, `DROP TRIGGER ${table}_no_replace ON ${table}`, `DROP FUNCTION boothwright_${table}_no_replace()`]),
    'DROP FUNCTION boothwright_record_only()',
  ],
};
