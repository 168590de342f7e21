import { DataSource } from 'typeorm';
import { afterEach, describe, expect, it } from 'vitest';
import { dataSourceOptions, openDataSource } from '../../../server/db/data-source';
import { migrations } from '../../../server/db/migrations';
import { createTestDatabase, type TestDatabase } from '../../helpers/test-database';

let database: TestDatabase | undefined;
afterEach(async () => database?.drop());

const now = '2027-01-04T09:00:00.000Z';
const before = migrations.slice(0, migrations.findIndex((m) => m.name === 'ThinningRangeGiven1764780000000'));

async function product(ds: DataSource, name: string, least: number, most: number): Promise<number> {
  await ds.query(
    `INSERT INTO products (name, kind, chemistry, volume_solids_pct, thinner_min_pct, thinner_max_pct, hazards, drying_times, created_at, updated_at)
     VALUES ('${name}', 'topcoat', 'water-borne', 35, ${least}, ${most}, '[]', '[]', '${now}', '${now}')`,
  );
  const [row] = await ds.query(`SELECT id FROM products WHERE name = '${name}'`);
  return Number(row.id);
}

describe('the thinning-range migration', () => {
  it('reads an untouched 0–0 % as "no range given", keeps a 0–0 % someone set on purpose and every real range', async () => {
    database = await createTestDatabase();
    const older = new DataSource({ ...dataSourceOptions(database.config), migrations: before });
    await older.initialize();
    await older.runMigrations({ transaction: 'each' });
    await product(older, 'Never given', 0, 0);
    const chosen = await product(older, 'Do not thin', 0, 0);
    // An edit of the thinning figures, as the product service audits it: 0–0 was chosen, not defaulted.
    await older.query(
      `INSERT INTO audit_entries (at, user_id, user_name, action, entity, entity_id, summary, changes)
       VALUES ('${now}', NULL, 'Owner', 'update', 'product', '${chosen}', 'Changed data sheet Do not thin', '{"thinnerMaxPct":{"from":10,"to":0}}')`,
    );
    await product(older, 'Ranged', 5, 10);
    await older.destroy();

    const ds = await openDataSource(database.config, { migrate: true });
    const rows: { name: string; given: unknown }[] = await ds.query('SELECT name, thinning_range_given AS given FROM products ORDER BY name');
    expect(rows.map((r) => [r.name, Boolean(r.given)])).toEqual([
      ['Do not thin', true],
      ['Never given', false],
      ['Ranged', true],
    ]);
    await ds.destroy();
  });
});
