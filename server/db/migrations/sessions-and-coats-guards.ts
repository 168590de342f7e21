// Rules the database itself enforces, so no code path (or hand-written SQL) can break them:
// coat records are append-only, and one booth never has two live spray sessions at once.
// The service checks first and explains in words; these are the last line.

const overlapCondition = `s.booth_id = NEW.booth_id AND s.id <> NEW.id AND s.state <> 'cancelled' AND s.start_at < NEW.end_at AND s.end_at > NEW.start_at`;

export const sqliteGuards = {
  up: [
    ...['coats', 'coat_parts'].flatMap((table) => [
      `CREATE TRIGGER ${table}_no_update BEFORE UPDATE ON ${table} BEGIN SELECT RAISE(ABORT, 'append_only: coat records are never changed; record a correction'); END`,
      `CREATE TRIGGER ${table}_no_delete BEFORE DELETE ON ${table} BEGIN SELECT RAISE(ABORT, 'append_only: coat records are never deleted'); END`,
    ]),
    `CREATE TRIGGER spray_sessions_no_overlap_insert BEFORE INSERT ON spray_sessions
     WHEN NEW.state <> 'cancelled' AND EXISTS (SELECT 1 FROM spray_sessions s WHERE ${overlapCondition.replace('s.id <> NEW.id AND ', '')})
     BEGIN SELECT RAISE(ABORT, 'booth_overlap'); END`,
    `CREATE TRIGGER spray_sessions_no_overlap_update BEFORE UPDATE OF booth_id, start_at, end_at, state ON spray_sessions
     WHEN NEW.state <> 'cancelled' AND EXISTS (SELECT 1 FROM spray_sessions s WHERE ${overlapCondition})
     BEGIN SELECT RAISE(ABORT, 'booth_overlap'); END`,
  ],
  down: ['coats', 'coat_parts']
    .flatMap((table) => [`DROP TRIGGER ${table}_no_update`, `DROP TRIGGER ${table}_no_delete`])
    .concat(['DROP TRIGGER spray_sessions_no_overlap_insert', 'DROP TRIGGER spray_sessions_no_overlap_update']),
};

export const postgresGuards = {
  up: [
    `CREATE FUNCTION boothwright_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
     BEGIN RAISE EXCEPTION 'append_only: coat records are never changed or deleted; record a correction'; END $$`,
    `CREATE TRIGGER coats_append_only BEFORE UPDATE OR DELETE ON coats FOR EACH ROW EXECUTE FUNCTION boothwright_append_only()`,
    `CREATE TRIGGER coat_parts_append_only BEFORE UPDATE OR DELETE ON coat_parts FOR EACH ROW EXECUTE FUNCTION boothwright_append_only()`,
    // The advisory lock per booth makes concurrent bookings (from any app instance) wait their turn.
    `CREATE FUNCTION boothwright_no_booth_overlap() RETURNS trigger LANGUAGE plpgsql AS $$
     BEGIN
       IF NEW.state <> 'cancelled' THEN
         PERFORM pg_advisory_xact_lock(7301, NEW.booth_id);
         IF EXISTS (SELECT 1 FROM spray_sessions s WHERE ${overlapCondition}) THEN
           RAISE EXCEPTION 'booth_overlap';
         END IF;
       END IF;
       RETURN NEW;
     END $$`,
    `CREATE TRIGGER spray_sessions_no_overlap BEFORE INSERT OR UPDATE ON spray_sessions FOR EACH ROW EXECUTE FUNCTION boothwright_no_booth_overlap()`,
  ],
  down: [
    'DROP TRIGGER spray_sessions_no_overlap ON spray_sessions',
    'DROP FUNCTION boothwright_no_booth_overlap()',
    'DROP TRIGGER coat_parts_append_only ON coat_parts',
    'DROP TRIGGER coats_append_only ON coats',
    'DROP FUNCTION boothwright_append_only()',
  ],
};
