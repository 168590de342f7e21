import pino from 'pino';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDataSource } from '../../../server/db/data-source';
import type { ChangeEvent } from '../../../server/services/events';
import { PgEventBus } from '../../../server/services/pg-event-bus';
import { createTestDatabase, type TestDatabase } from '../../helpers/test-database';

// The shared change feed only exists on PostgreSQL; on SQLite one process has the in-process bus.
const pgUrl = process.env.TEST_DATABASE_URL;

let database: TestDatabase;
let dataSource: DataSource;
let url: string;
const buses: PgEventBus[] = [];

async function startBus(): Promise<{ bus: PgEventBus; heard: ChangeEvent[] }> {
  const bus = new PgEventBus(dataSource, url, pino({ level: 'silent' }));
  await bus.start();
  buses.push(bus);
  const heard: ChangeEvent[] = [];
  bus.subscribe((event) => heard.push(event));
  return { bus, heard };
}

async function waitUntil(what: string, check: () => boolean | Promise<boolean>): Promise<void> {
  for (let i = 0; !(await check()); i++) {
    if (i > 150) throw new Error(`Gave up waiting: ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The server process ids of the change-feed listeners on this database. */
const listenerPids = async (): Promise<number[]> =>
  ((await dataSource.query(`SELECT pid FROM pg_stat_activity WHERE application_name = 'boothwright-change-feed' AND datname = current_database()`)) as { pid: number }[]).map((r) => r.pid);

describe.skipIf(!pgUrl)('the change feed shared through PostgreSQL (skipped without TEST_DATABASE_URL)', () => {
  beforeAll(async () => {
    database = await createTestDatabase();
    if (database.config.kind !== 'postgres') throw new Error('TEST_DATABASE_URL must name a PostgreSQL database');
    url = database.config.url;
    dataSource = await openDataSource(database.config, { migrate: false });
  });
  afterAll(async () => {
    await Promise.all(buses.map((bus) => bus.stop()));
    await dataSource?.destroy();
    await database?.drop();
  });

  it('delivers what one instance publishes to the subscribers of every instance, the publisher included, once each', async () => {
    const first = await startBus();
    const second = await startBus();
    first.bus.publish({ type: 'part.changed', id: 41, siteId: null });
    await waitUntil('both buses to hear part 41', () => first.heard.length > 0 && second.heard.length > 0);
    second.bus.publish({ type: 'spray-session.changed', id: 7, siteId: null });
    await waitUntil('both buses to hear session 7', () => first.heard.length > 1 && second.heard.length > 1);
    expect(first.heard).toEqual([{ type: 'part.changed', id: 41, siteId: null }, { type: 'spray-session.changed', id: 7, siteId: null }]);
    expect(second.heard).toEqual(first.heard);
  });

  it('listens again after its connection is cut, and hears its own changes meanwhile', async () => {
    const publisher = await startBus();
    const other = await startBus();
    const cut = await listenerPids();
    await dataSource.query(`SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = 'boothwright-change-feed' AND datname = current_database()`);
    other.bus.publish({ type: 'part.changed', id: 99, siteId: null });
    expect(other.heard).toContainEqual({ type: 'part.changed', id: 99, siteId: null });
    await waitUntil('every listener to reconnect on a new connection', async () => {
      const now = await listenerPids();
      return now.length === cut.length && now.every((pid) => !cut.includes(pid));
    });
    publisher.bus.publish({ type: 'part.changed', id: 100, siteId: null });
    await waitUntil('the other bus to hear part 100', () => other.heard.some((e) => e.type === 'part.changed' && e.id === 100));
  });
});
