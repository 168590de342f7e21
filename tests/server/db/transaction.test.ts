import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { openDataSource } from '../../../server/db/data-source';
import { JobEntity } from '../../../server/db/entities/job.entity';
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
});
