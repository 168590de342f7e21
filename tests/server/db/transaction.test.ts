import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { openDataSource } from '../../../server/db/data-source';
import { JobEntity } from '../../../server/db/entities/job.entity';
import { runAsOwnWork } from '../../../server/db/sqlite-gate';
import { inTransaction } from '../../../server/db/transaction';
import { createTestDatabase, type TestDatabase } from '../../helpers/test-database';

let database: TestDatabase;
let dataSource: DataSource;
beforeAll(async () => {
  database = await createTestDatabase();
  dataSource = await openDataSource(database.config, { migrate: true });
});
afterAll(async () => {
  await dataSource.destroy();
  await database.drop();
});

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('inTransaction', () => {
  it('lets the event loop in between queued transactions, so new requests and connections are not held until the queue empties', async () => {
    const order: string[] = [];
    const work = (i: number) =>
      runAsOwnWork(() =>
        inTransaction(dataSource, async (manager) => {
          await manager.query('SELECT 1');
          order.push(`transaction ${i}`);
        }),
      );
    const queue = Promise.all(Array.from({ length: 10 }, (_, i) => work(i)));
    // What a new connection or request body would be: I/O waiting for the next turn of the loop.
    setImmediate(() => order.push('waiting I/O'));
    await queue;
    expect(order.indexOf('waiting I/O')).toBeGreaterThan(-1);
    expect(order.indexOf('waiting I/O')).toBeLessThan(order.length - 1);
  });

  it('keeps overlapping transactions apart: each commits or rolls back on its own', async () => {
    const work = (i: number) =>
      inTransaction(dataSource, async (manager) => {
        await manager.insert(JobEntity, { customer: 'c', reference: `TX-${i}`, dueDate: '2027-01-01', createdAt: 'x', updatedAt: 'x' });
        // Yield while the transaction is open, so the others start before this one ends.
        await pause(15);
        if (i === 1) throw new Error('second one fails');
      });
    const results = await Promise.allSettled([work(0), work(1), work(2)]);
    expect(results.map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);
    expect((results[1] as PromiseRejectedResult).reason.message).toBe('second one fails');
    const saved = await dataSource.getRepository(JobEntity).find({ order: { reference: 'ASC' } });
    expect(saved.map((j) => j.reference)).toEqual(['TX-0', 'TX-2']);
  });

  it('never lets another request’s query into an open transaction: it neither sees its writes nor is rolled back with it', async () => {
    let opened!: () => void;
    const isOpen = new Promise<void>((resolve) => (opened = resolve));
    let finish!: () => void;
    const held = new Promise<void>((resolve) => (finish = resolve));
    const job = (reference: string) => ({ customer: 'c', reference, dueDate: '2027-01-01', createdAt: 'x', updatedAt: 'x' });
    const failing = inTransaction(dataSource, async (manager) => {
      await manager.insert(JobEntity, job('INSIDE-1'));
      opened();
      await held;
      throw new Error('the transaction rolls back');
    });
    await isOpen;
    // Two other requests while the transaction is open: one writes, one reads.
    const otherWrite = runAsOwnWork(() => dataSource.getRepository(JobEntity).insert(job('OUTSIDE-1')));
    const otherRead = runAsOwnWork(() => dataSource.getRepository(JobEntity).findBy({ reference: 'INSIDE-1' }));
    // Give them every chance to run inside the transaction before it ends.
    await pause(20);
    finish();
    await expect(failing).rejects.toThrow('the transaction rolls back');
    await otherWrite;
    expect(await otherRead).toEqual([]);
    expect(await dataSource.getRepository(JobEntity).countBy({ reference: 'OUTSIDE-1' })).toBe(1);
    expect(await dataSource.getRepository(JobEntity).countBy({ reference: 'INSIDE-1' })).toBe(0);
  });

  it('interleaves two transactions, each with queries started together, without sharing a client', async () => {
    const warnings: string[] = [];
    const onWarning = (warning: Error) => warnings.push(warning.message);
    process.on('warning', onWarning);
    try {
      const both = ['A', 'B'].map((name) =>
        inTransaction(dataSource, async (manager) => {
          await manager.insert(JobEntity, { customer: name, reference: `PAIR-${name}`, dueDate: '2027-01-01', createdAt: 'x', updatedAt: 'x' });
          await pause(5);
          // Started together on the transaction's one connection.
          return Promise.all([1, 2, 3, 4].map(() => manager.countBy(JobEntity, { customer: name })));
        }),
      );
      expect(await Promise.all(both)).toEqual([
        [1, 1, 1, 1],
        [1, 1, 1, 1],
      ]);
      await new Promise((resolve) => setImmediate(resolve));
      expect(warnings.filter((w) => w.includes('already executing'))).toEqual([]);
    } finally {
      process.off('warning', onWarning);
    }
  });
});
