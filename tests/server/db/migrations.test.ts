import { DataSource } from 'typeorm';
import { afterEach, describe, expect, it } from 'vitest';
import { dataSourceOptions, openDataSource } from '../../../server/db/data-source';
import { migrations } from '../../../server/db/migrations';
import { createTestDatabase, type TestDatabase } from '../../helpers/test-database';

// Two branches each added a migration: a database may have run either one first, or neither.
let database: TestDatabase | undefined;
afterEach(async () => database?.drop());

const named = (name: string) => migrations.filter((m) => m.name === name);
// An older build had every migration up to the later of the two, less the one it lacked; the
// migrations added after both (which may build on either) were not in it.
const olderBuild = migrations.slice(0, migrations.findIndex((m) => m.name === 'AuditSites1764740000000') + 1);
const allBut = (name: string) => olderBuild.filter((m) => m.name !== name);

/** Runs only some of the migrations, as an install of an older build would have. */
async function migrateWith(subset: typeof migrations, before?: (ds: DataSource) => Promise<void>): Promise<void> {
  const older = new DataSource({ ...dataSourceOptions(database!.config), migrations: subset });
  await older.initialize();
  await older.runMigrations({ transaction: 'each' });
  await before?.(older);
  await older.destroy();
}

/** Opens the database as the app starts: every migration not yet run, runs. */
async function startApp(): Promise<DataSource> {
  return openDataSource(database!.config, { migrate: true });
}

async function expectBothApplied(ds: DataSource): Promise<void> {
  const ran = (await ds.query('SELECT name FROM migrations')).map((row: { name: string }) => row.name);
  expect(ran).toEqual(expect.arrayContaining(['DenibsAndJobLifeCycle1764730000000', 'AuditSites1764740000000']));
  expect(ran).toHaveLength(migrations.length);
  await ds.query('SELECT id, spray_session_id, grit, abraded_at FROM denibs');
  await ds.query('SELECT denib_id, part_id FROM denib_parts');
  await ds.query('SELECT ready_at, state_set_by, collected_from_rack_id, collected_from_shelf FROM jobs j JOIN parts p ON p.job_id = j.id');
  await ds.query('SELECT site_id FROM audit_entries');
}

const now = '2027-01-04T09:00:00.000Z';
const oldFinishedJob = (ds: DataSource) =>
  ds.query(`INSERT INTO jobs (customer, reference, due_date, state, created_at, updated_at) VALUES ('Old Ltd', 'OLD-1', '2026-12-01', 'finished', '${now}', '${now}')`);

describe('migrations', () => {
  it('run in full on a fresh database', async () => {
    database = await createTestDatabase();
    const ds = await startApp();
    await expectBothApplied(ds);
    await ds.destroy();
  });

  it('add denibs and the job life cycle to a database that already has audit sites', async () => {
    database = await createTestDatabase();
    await migrateWith(allBut('DenibsAndJobLifeCycle1764730000000'), oldFinishedJob);
    const ds = await startApp();
    await expectBothApplied(ds);
    expect(await ds.query("SELECT state, state_set_by FROM jobs WHERE reference = 'OLD-1'")).toEqual([{ state: 'delivered', state_set_by: 'lead' }]);
    await ds.destroy();
  });

  it('add audit sites to a database that already has denibs', async () => {
    database = await createTestDatabase();
    await migrateWith(allBut('AuditSites1764740000000'));
    expect(named('AuditSites1764740000000')).toHaveLength(1);
    const ds = await startApp();
    await expectBothApplied(ds);
    await ds.destroy();
  });
});
