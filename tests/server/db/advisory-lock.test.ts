import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { advisoryLocks, withAdvisoryLock } from '../../../server/db/advisory-lock';
import { openDataSource } from '../../../server/db/data-source';
import { createTestDatabase, type TestDatabase } from '../../helpers/test-database';

let database: TestDatabase;
let first: DataSource;
let second: DataSource;

beforeAll(async () => {
  database = await createTestDatabase();
  // Two DataSources on one database stand for two app instances.
  first = await openDataSource(database.config, { migrate: true });
  second = await openDataSource(database.config, { migrate: false });
});
afterAll(async () => {
  await first.destroy();
  await second.destroy();
  await database.drop();
});

const tick = advisoryLocks.notificationTick;

describe('withAdvisoryLock', () => {
  it.skipIf(!process.env.TEST_DATABASE_URL)('lets one instance in at a time and frees the lock when the work ends, even by failing', async () => {
    let release!: () => void;
    const holding = withAdvisoryLock(first, tick, { wait: false }, () => new Promise<string>((resolve) => (release = () => resolve('done'))));
    await expect.poll(() => release !== undefined).toBe(true);
    expect(await withAdvisoryLock(second, tick, { wait: false }, async () => 'second')).toEqual({ held: false });
    release();
    expect(await holding).toEqual({ held: true, value: 'done' });
    await expect(withAdvisoryLock(second, tick, { wait: false }, async () => Promise.reject(new Error('mail server down')))).rejects.toThrow('mail server down');
    expect(await withAdvisoryLock(first, tick, { wait: false }, async () => 'after')).toEqual({ held: true, value: 'after' });
  });

  it('runs the work when no other instance holds the lock (always on SQLite: one process)', async () => {
    expect(await withAdvisoryLock(first, tick, { wait: false }, async () => 42)).toEqual({ held: true, value: 42 });
  });
});
