import type { DataSource } from 'typeorm';

/**
 * PostgreSQL advisory lock keys (two-integer form). 7301 is taken by the per-booth booking
 * guard in the sessions-and-coats migration; 7302 holds the locks that make one instance of
 * several do a job alone.
 */
export const advisoryLocks = {
  notificationTick: [7302, 1],
  migrations: [7302, 2],
} as const satisfies Record<string, readonly [number, number]>;

type LockKey = (typeof advisoryLocks)[keyof typeof advisoryLocks];

export type LockOutcome<T> = { held: true; value: T } | { held: false };

const isPostgres = (dataSource: DataSource) => dataSource.options.type === 'postgres';

/**
 * Runs `work` while this process holds a transaction-level advisory lock, taken in a
 * transaction kept open on one pooled connection for as long as `work` runs (`work` itself uses
 * other connections). `wait: false` gives up at once when another instance holds it. The lock
 * ends with that transaction, so an instance that dies mid-work frees it for the others. On
 * SQLite (one process) `work` simply runs.
 */
export async function withAdvisoryLock<T>(dataSource: DataSource, key: LockKey, options: { wait: boolean }, work: () => Promise<T>): Promise<LockOutcome<T>> {
  if (!isPostgres(dataSource)) return { held: true, value: await work() };
  const runner = dataSource.createQueryRunner();
  try {
    await runner.startTransaction();
    if (options.wait) {
      await runner.query('SELECT pg_advisory_xact_lock($1, $2)', [...key]);
    } else {
      const [{ locked }] = (await runner.query('SELECT pg_try_advisory_xact_lock($1, $2) AS locked', [...key])) as { locked: boolean }[];
      if (!locked) return { held: false };
    }
    return { held: true, value: await work() };
  } finally {
    // Nothing was written on this connection: ending the transaction only frees the lock.
    if (runner.isTransactionActive) await runner.rollbackTransaction().catch(() => undefined);
    await runner.release();
  }
}
