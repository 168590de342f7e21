import type Database from 'better-sqlite3';
import type { DataSource } from 'typeorm';
import { isHoldingConnection, holdingConnection, sqliteGate } from './sqlite-gate';

/**
 * Reads on the hot path straight through the driver TypeORM already holds, with bound
 * parameters: better-sqlite3 keeps one prepared statement per SQL text, PostgreSQL gets `$n`
 * placeholders. SQL is written with `?`; rows come back as the driver gives them (snake_case).
 */
export interface FastRead {
  all<T>(sql: string, params: readonly unknown[]): Promise<T[]>;
  one<T>(sql: string, params: readonly unknown[]): Promise<T | undefined>;
}

const readers = new WeakMap<DataSource, FastRead>();

/** `?` → `$1, $2, …` for pg (the SQL here never holds a literal question mark). */
export function numberedPlaceholders(sql: string): string {
  let n = 0;
  return sql.replace(/\?/g, () => `$${++n}`);
}

function sqliteRead(dataSource: DataSource): FastRead {
  const db = (dataSource.driver as unknown as { databaseConnection: Database.Database }).databaseConnection;
  const statements = new Map<string, Database.Statement>();
  const prepared = (sql: string) => {
    let statement = statements.get(sql);
    if (!statement) statements.set(sql, (statement = db.prepare(sql)));
    return statement;
  };
  const gate = sqliteGate(dataSource);
  // The one shared connection may be inside another request's transaction: read only when no one
  // else holds it (then no transaction is open) or when the transaction is our own.
  const run = <T>(read: () => T): Promise<T> => (gate.holder === null || isHoldingConnection(gate) ? Promise.resolve(read()) : holdingConnection(dataSource, async () => read()));
  return {
    all: <T>(sql: string, params: readonly unknown[]) => run(() => prepared(sql).all(...params) as T[]),
    one: <T>(sql: string, params: readonly unknown[]) => run(() => prepared(sql).get(...params) as T | undefined),
  };
}

function postgresRead(dataSource: DataSource): FastRead {
  const texts = new Map<string, string>();
  const text = (sql: string) => {
    let numbered = texts.get(sql);
    if (!numbered) texts.set(sql, (numbered = numberedPlaceholders(sql)));
    return numbered;
  };
  const all = <T>(sql: string, params: readonly unknown[]) => dataSource.query(text(sql), [...params]) as Promise<T[]>;
  return { all, one: async <T>(sql: string, params: readonly unknown[]) => (await all<T>(sql, params))[0] };
}

export function fastRead(dataSource: DataSource): FastRead {
  let reader = readers.get(dataSource);
  if (!reader) readers.set(dataSource, (reader = dataSource.options.type === 'postgres' ? postgresRead(dataSource) : sqliteRead(dataSource)));
  return reader;
}
