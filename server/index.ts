import path from 'node:path';
import pino from 'pino';
import { createApp } from './app';
import { startNotifications } from './mail/notifications-runtime';
import { startEventBus } from './services/pg-event-bus';
import { loadConfig } from './config/env';
import { resolveSignInSecret } from './config/sign-in-secret';
import { openDataSource } from './db/data-source';
import { claimDatabase } from './db/database-lock';
import { demoSignInLines, demoUsers } from './db/seed';
import { UserEntity } from './db/entities/user.entity';

async function main(): Promise<void> {
  const config = loadConfig();
  const logger = pino({ level: config.logLevel });
  // While the server runs, a restore (or a second server) on the same SQLite file is refused.
  if (config.database.kind === 'sqlite' && config.database.path !== ':memory:') process.on('exit', claimDatabase(config.database.path, 'server'));
  const dataSource = await openDataSource(config.database, { migrate: true });
  // Several instances on PostgreSQL must share SESSION_SECRET; one machine can keep its own beside the data.
  const dataDir = config.database.kind === 'sqlite' ? path.dirname(path.resolve(config.database.path)) : path.resolve('data');
  const signInSecret = resolveSignInSecret(config.signInSecret, dataDir);
  const notifications = await startNotifications(dataSource, config, logger, { schedule: true });
  const changeFeed = await startEventBus(dataSource, config, logger);
  const app = createApp({ dataSource, config, signInSecret, logger, events: changeFeed.events, notifications, clientDir: path.resolve(config.clientDir) });
  const server = app.listen(config.port, config.host, () => {
    void announce(config.port, dataSource);
  });

  const shutdown = (signal: string) => {
    logger.info({ signal }, 'shutting down');
    server.close(() => {
      void notifications
        .stop()
        .then(() => changeFeed.stop())
        .then(() => dataSource.destroy())
        .finally(() => process.exit(0));
    });
    // Open keep-alive connections must not hold the process past a few seconds.
    setTimeout(() => process.exit(0), 5000).unref();
    server.closeIdleConnections();
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));
}

async function announce(port: number, dataSource: Awaited<ReturnType<typeof openDataSource>>): Promise<void> {
  console.log(`\nBoothwright is running on http://localhost:${port}`);
  const demoStillThere = await dataSource.getRepository(UserEntity).existsBy({ email: demoUsers[0].email });
  if (demoStillThere) console.log(`Demo sign-ins (role, e-mail, password):\n${demoSignInLines().join('\n')}\n`);
}

main().catch((error) => {
  console.error('Boothwright could not start:', error);
  process.exit(1);
});
