import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { openDataSource } from '../../../server/db/data-source';
import { seedDemoHistory } from '../../../server/db/demo-history';
import { seedDemoShop } from '../../../server/db/seed';
import { createTestDatabase, type TestDatabase } from '../../helpers/test-database';

// Hand-written SQL run straight against the database, as someone with the file or a SQL prompt
// would: every way of rewriting the record is refused, and normal inserts still go in.
let database: TestDatabase;
let dataSource: DataSource;
let postgres: boolean;
beforeAll(async () => {
  database = await createTestDatabase();
  dataSource = await openDataSource(database.config, { migrate: true });
  postgres = dataSource.options.type === 'postgres';
  await seedDemoShop(dataSource, { uploadDir: path.join(database.uploadDir) });
  await seedDemoHistory(dataSource, { weeks: 2 });
  // The demo history holds no denib: record one the ordinary way, to have a row to attack.
  await dataSource.query(
    "INSERT INTO denibs (spray_session_id, grit, abraded_at, notes, recorded_by_name, recorded_at) SELECT MIN(id), 'P320', '2027-01-04T08:00:00.000Z', 'Faces', 'test', '2027-01-04T08:05:00.000Z' FROM spray_sessions",
  );
  await dataSource.query('INSERT INTO denib_parts (denib_id, part_id) SELECT (SELECT MIN(id) FROM denibs), MIN(id) FROM parts');
}, 60_000);
afterAll(async () => {
  await dataSource?.destroy();
  await database?.drop();
});

async function columnsOf(table: string): Promise<string[]> {
  if (postgres) {
    const rows = (await dataSource.query('SELECT column_name AS name FROM information_schema.columns WHERE table_name = $1 ORDER BY ordinal_position', [table])) as { name: string }[];
    return rows.map((r) => r.name);
  }
  return ((await dataSource.query(`PRAGMA table_info(${table})`)) as { name: string }[]).map((r) => r.name);
}

/** A SELECT of one row's columns with one text column rewritten, to feed an INSERT. */
async function rewrittenCopy(table: string, where: string, textColumn: string | null): Promise<{ columns: string; select: string }> {
  const columns = await columnsOf(table);
  const values = columns.map((c) => (c === textColumn ? `'rewritten' AS ${c}` : c));
  return { columns: columns.join(', '), select: `SELECT ${values.join(', ')} FROM ${table} WHERE ${where}` };
}

const rowOf = async (table: string, where: string) => (await dataSource.query(`SELECT * FROM ${table} WHERE ${where}`)) as unknown[];
const count = async (table: string) => Number(((await dataSource.query(`SELECT COUNT(*) AS n FROM ${table}`)) as { n: number | string }[])[0].n);

interface Guarded {
  table: string;
  /** One existing row, by a condition that names it. */
  where: () => Promise<string>;
  textColumn: string | null;
  conflict: string;
}

const firstId = async (table: string) => `id = ${((await dataSource.query(`SELECT MIN(id) AS id FROM ${table}`)) as { id: number }[])[0].id}`;
const guarded: Guarded[] = [
  { table: 'coats', where: () => firstId('coats'), textColumn: 'notes', conflict: 'id' },
  { table: 'mixes', where: () => firstId('mixes'), textColumn: 'recorded_by_name', conflict: 'id' },
  { table: 'readings', where: () => firstId('readings'), textColumn: 'source', conflict: 'id' },
  { table: 'audit_entries', where: () => firstId('audit_entries'), textColumn: 'summary', conflict: 'id' },
  { table: 'denibs', where: () => firstId('denibs'), textColumn: 'notes', conflict: 'id' },
  {
    table: 'denib_parts',
    where: async () => {
      const [row] = (await dataSource.query('SELECT denib_id, part_id FROM denib_parts ORDER BY denib_id, part_id LIMIT 1')) as { denib_id: number; part_id: number }[];
      return `denib_id = ${row.denib_id} AND part_id = ${row.part_id}`;
    },
    textColumn: null,
    conflict: 'denib_id, part_id',
  },
  {
    table: 'coat_parts',
    where: async () => {
      const [row] = (await dataSource.query('SELECT coat_id, part_id FROM coat_parts ORDER BY coat_id, part_id LIMIT 1')) as { coat_id: number; part_id: number }[];
      return `coat_id = ${row.coat_id} AND part_id = ${row.part_id}`;
    },
    textColumn: null,
    conflict: 'coat_id, part_id',
  },
];

describe.each(guarded)('the $table record', ({ table, where, textColumn, conflict }) => {
  it('refuses an insert that replaces a row, an upsert, an update, a delete and a truncate', async () => {
    const condition = await where();
    const before = await rowOf(table, condition);
    const total = await count(table);
    expect(before).toHaveLength(1);
    const { columns, select } = await rewrittenCopy(table, condition, textColumn);
    const setClause = textColumn ? `${textColumn} = 'rewritten'` : conflict.split(', ').map((c) => `${c} = excluded.${c}`).join(', ');
    const attempts = [
      `INSERT INTO ${table} (${columns}) ${select}`,
      `INSERT INTO ${table} (${columns}) ${select} ON CONFLICT (${conflict}) DO UPDATE SET ${setClause}`,
      `UPDATE ${table} SET ${setClause.replace(/excluded\./g, '')} WHERE ${condition}`,
      `DELETE FROM ${table} WHERE ${condition}`,
      `DELETE FROM ${table}`,
      ...(postgres ? [`TRUNCATE ${table} CASCADE`] : [`INSERT OR REPLACE INTO ${table} (${columns}) ${select}`, `REPLACE INTO ${table} (${columns}) ${select}`, `UPDATE OR REPLACE ${table} SET ${setClause.replace(/excluded\./g, '')} WHERE ${condition}`]),
    ];
    for (const sql of attempts) {
      await expect(dataSource.query(sql), sql).rejects.toThrow(/append_only/);
    }
    expect(await rowOf(table, condition)).toEqual(before);
    expect(await count(table)).toBe(total);
  });
});

describe('coat versions', () => {
  const verb = () => (postgres ? 'INSERT INTO' : 'INSERT OR REPLACE INTO');
  /** A copy of coat `id` as a new row, with `changes` (column → SQL expression) applied. */
  async function copyOf(id: number, changes: Record<string, string>): Promise<string> {
    const columns = await columnsOf('coats');
    const values = columns.map((c) => (c in changes ? `${changes[c]} AS ${c}` : c));
    return `${verb()} coats (${columns.join(', ')}) SELECT ${values.join(', ')} FROM coats WHERE id = ${id}`;
  }
  const nextId = '(SELECT MAX(id) + 1 FROM coats)';

  it('takes a new coat row, then refuses one that reuses its idempotency key', async () => {
    const [{ id }] = (await dataSource.query('SELECT MIN(id) AS id FROM coats')) as { id: number }[];
    const total = await count('coats');
    await dataSource.query(await copyOf(id, { id: nextId, idempotency_key: "'tablet-resend-0001'" }));
    expect(await count('coats')).toBe(total + 1);
    const [first] = (await dataSource.query("SELECT id FROM coats WHERE idempotency_key = 'tablet-resend-0001'")) as { id: number }[];
    await expect(dataSource.query(await copyOf(id, { id: nextId, idempotency_key: "'tablet-resend-0001'", notes: "'rewritten'" }))).rejects.toThrow(/append_only/);
    expect(await dataSource.query("SELECT id FROM coats WHERE idempotency_key = 'tablet-resend-0001'")).toEqual([first]);
    expect(await count('coats')).toBe(total + 1);
  });

  it('refuses a second correction of a version already corrected', async () => {
    const [{ replaces_id: corrected }] = (await dataSource.query('SELECT replaces_id FROM coats WHERE replaces_id IS NOT NULL LIMIT 1')) as { replaces_id: number }[];
    const [correction] = await rowOf('coats', `replaces_id = ${corrected}`);
    await expect(dataSource.query(await copyOf(corrected, { id: nextId, replaces_id: String(corrected), idempotency_key: 'NULL' }))).rejects.toThrow(/append_only/);
    expect(await rowOf('coats', `replaces_id = ${corrected}`)).toEqual([correction]);
  });

  it('still takes normal inserts of readings and audit entries', async () => {
    const readings = await count('readings');
    const booth = ((await dataSource.query('SELECT MIN(id) AS id FROM booths')) as { id: number }[])[0].id;
    await dataSource.query(`INSERT INTO readings (booth_id, at, air_temp_c, relative_humidity_pct, dew_point_c, source) VALUES (${booth}, '2027-01-04T08:00:00.000Z', 20, 50, 9.3, 'typed')`);
    await dataSource.query(`INSERT INTO audit_entries (at, user_name, action, entity, summary) VALUES ('2027-01-04T08:00:00.000Z', 'test', 'create', 'reading', 'A reading')`);
    expect(await count('readings')).toBe(readings + 1);
  });
});
