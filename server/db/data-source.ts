import fs from 'node:fs';
import path from 'node:path';
import 'reflect-metadata';
import { DataSource, type DataSourceOptions } from 'typeorm';
import type { DatabaseConfig } from '../config/env';
import { advisoryLocks, withAdvisoryLock } from './advisory-lock';
import { entities } from './entities';
import { migrations } from './migrations';
import { SnakeNamingStrategy } from './naming-strategy';

export function dataSourceOptions(database: DatabaseConfig): DataSourceOptions {
  const common = { entities, migrations, synchronize: false, namingStrategy: new SnakeNamingStrategy(), logging: false } as const;
  if (database.kind === 'postgres') {
    return { ...common, type: 'postgres', url: database.url };
  }
  if (database.path !== ':memory:') fs.mkdirSync(path.dirname(path.resolve(database.path)), { recursive: true });
  return {
    ...common,
    type: 'better-sqlite3',
    database: database.path,
    // WAL lets readers go on while a coat is written; the busy timeout queues concurrent writers.
    prepareDatabase: (db: { pragma: (sql: string) => unknown }) => {
      db.pragma('journal_mode = WAL');
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
      db.pragma('synchronous = NORMAL');
    },
  };
}

export async function openDataSource(database: DatabaseConfig, options: { migrate: boolean }): Promise<DataSource> {
  const dataSource = new DataSource(dataSourceOptions(database));
  await dataSource.initialize();
  // Several instances starting together on PostgreSQL migrate one after another, not at once.
  if (options.migrate) await withAdvisoryLock(dataSource, advisoryLocks.migrations, { wait: true }, () => dataSource.runMigrations({ transaction: 'each' }));
  return dataSource;
}
