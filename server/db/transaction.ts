import type { DataSource, EntityManager, QueryRunner } from 'typeorm';
import { holdingConnection } from './sqlite-gate';

/**
 * One client does one thing at a time: work inside a transaction may start queries together
 * (Promise.all over the manager), but they all belong to the transaction's one PostgreSQL client,
 * which must not be handed a query while it runs another. They go through in turn.
 */
function oneQueryAtATime(runner: QueryRunner): void {
  const query = runner.query.bind(runner) as (...args: unknown[]) => Promise<unknown>;
  let tail: Promise<unknown> = Promise.resolve();
  runner.query = ((...args: unknown[]) => {
    const run = tail.then(() => query(...args));
    tail = run.catch(() => undefined);
    return run;
  }) as QueryRunner['query'];
}

/**
 * Runs `work` in a transaction that no other request's query can enter. PostgreSQL gives each
 * transaction its own pooled connection, used one query at a time. TypeORM drives better-sqlite3
 * through one shared connection: there the transaction holds the connection (see sqlite-gate.ts)
 * and every other query waits until it commits or rolls back (SQLite has one writer anyway). A
 * call from inside `work` joins the running transaction as a savepoint.
 */
export function inTransaction<T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  if (dataSource.options.type !== 'better-sqlite3') {
    return dataSource.transaction((manager) => {
      if (manager.queryRunner) oneQueryAtATime(manager.queryRunner);
      return work(manager);
    });
  }
  return holdingConnection(dataSource, () => dataSource.transaction(work));
}
