import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp } from '../../server/app';
import { parseConfig, type AppConfig } from '../../server/config/env';
import { openDataSource } from '../../server/db/data-source';
import { demoPassword, seedDemoShop } from '../../server/db/seed';
import type { Clock } from '../../server/lib/clock';
import { createTestDatabase, type TestDatabase } from './test-database';

export const testSecret = 'test-secret-for-boothwright-suite';

export interface TestContext {
  app: Express;
  dataSource: DataSource;
  database: TestDatabase;
  config: AppConfig;
  /** A second app on the same database, as after a restart. */
  restart(): Express;
  close(): Promise<void>;
}

export async function startTestApp(options: { seed?: boolean; clock?: Clock; loginRateLimit?: number } = {}): Promise<TestContext> {
  const database = await createTestDatabase();
  const config = { ...parseConfig({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: String(options.loginRateLimit ?? 50), UPLOAD_DIR: database.uploadDir }), database: database.config };
  const dataSource = await openDataSource(database.config, { migrate: true });
  if (options.seed !== false) await seedDemoShop(dataSource, { uploadDir: config.uploadDir });
  const build = () => createApp({ dataSource, config, signInSecret: testSecret, clock: options.clock });
  return {
    app: build(),
    dataSource,
    database,
    config,
    restart: build,
    close: async () => {
      await dataSource.destroy();
      await database.drop();
    },
  };
}

export const demo = {
  admin: 'owner@larchmere.test',
  lead: 'lead@larchmere.test',
  sprayer: 'sprayer@larchmere.test',
  assembler: 'assembler@larchmere.test',
} as const;

export interface SignedIn {
  agent: ReturnType<typeof request.agent>;
  csrf: string;
}

export async function csrfFor(agent: ReturnType<typeof request.agent>): Promise<string> {
  const res = await agent.get('/api/auth/csrf').expect(200);
  return res.body.token as string;
}

/** A cookie-keeping agent signed in as one of the demo users, with its CSRF token. */
export async function signIn(app: Express, email: string, password = demoPassword): Promise<SignedIn> {
  const agent = request.agent(app);
  const csrf = await csrfFor(agent);
  await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email, password }).expect(200);
  return { agent, csrf };
}
