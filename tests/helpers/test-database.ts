import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import type { DatabaseConfig } from '../../server/config/env';

export interface TestDatabase {
  config: DatabaseConfig;
  /** A fresh upload folder that goes with this database. */
  uploadDir: string;
  drop(): Promise<void>;
}

/**
 * A fresh, empty database for one test file: a SQLite file in a temp folder, or, when
 * TEST_DATABASE_URL is set, a new PostgreSQL database made beside the one it names.
 */
export async function createTestDatabase(): Promise<TestDatabase> {
  const pgUrl = process.env.TEST_DATABASE_URL;
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-test-'));
  const uploadDir = path.join(dir, 'uploads');
  const removeDir = async () => fs.rmSync(dir, { recursive: true, force: true });
  if (pgUrl) {
    const pgDatabase = await createPostgresDatabase(pgUrl);
    return { ...pgDatabase, uploadDir, drop: async () => Promise.all([pgDatabase.drop(), removeDir()]).then(() => undefined) };
  }
  return { config: { kind: 'sqlite', path: path.join(dir, 'test.sqlite') }, uploadDir, drop: removeDir };
}

async function createPostgresDatabase(adminUrl: string): Promise<Omit<TestDatabase, 'uploadDir'>> {
  const name = `bw_test_${randomBytes(6).toString('hex')}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    config: { kind: 'postgres', url: url.toString() },
    drop: async () => {
      const client = new pg.Client({ connectionString: adminUrl });
      await client.connect();
      try {
        // An autovacuum worker busy on the new database has no role, and PostgreSQL 15's FORCE then
        // refuses to end it (42501); it is gone a moment later, so try again a few times.
        for (let attempt = 1; ; attempt++) {
          try {
            await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
            break;
          } catch (error) {
            if ((error as { code?: string }).code !== '42501' || attempt >= 20) throw error;
            await new Promise((resolve) => setTimeout(resolve, 250));
          }
        }
      } finally {
        await client.end();
      }
    },
  };
}
