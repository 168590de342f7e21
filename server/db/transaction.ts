import type { DataSource, EntityManager } from 'typeorm';

const queues = new WeakMap<DataSource, Promise<unknown>>();

/**
 * Runs `work` in a transaction. TypeORM drives better-sqlite3 through one shared connection,
 * where a second BEGIN while another transaction is open fails; so on SQLite transactions
 * wait their turn here (SQLite allows one writer at a time anyway). PostgreSQL gives each
 * transaction its own pooled connection and needs no queue.
 */
export function inTransaction<T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  if (dataSource.options.type !== 'better-sqlite3') return dataSource.transaction(work);
  const previous = queues.get(dataSource) ?? Promise.resolve();
  const run = previous.then(() => dataSource.transaction(work));
  queues.set(
    dataSource,
    run.catch(() => undefined),
  );
  // Never call inTransaction from inside `work`: the inner call would wait for the outer one forever.
  return run;
}
