import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import pino, { type Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import { createBoothSchema, updateBoothSchema } from '../shared/schemas/booth';
import { createRackSchema, updateRackSchema } from '../shared/schemas/rack';
import { configurePassport } from './auth/passport';
import type { AppConfig } from './config/env';
import { systemClock, type Clock } from './lib/clock';
import { requireCsrf } from './middleware/csrf';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { securityHeaders } from './middleware/security';
import { sessionMiddleware } from './middleware/session';
import { buildOpenApiDocument } from './openapi';
import { authRoutes } from './routes/auth';
import { masterDataRoutes } from './routes/master-data';
import { auditRoutes, settingsRoutes } from './routes/settings';
import { userRoutes } from './routes/users';
import { createBoothService } from './services/booths';
import { createRackService } from './services/racks';
import { createSettingsService } from './services/settings';
import { createUserService } from './services/users';

export interface AppDeps {
  dataSource: DataSource;
  config: AppConfig;
  sessionSecret: string;
  clock?: Clock;
  logger?: Logger;
  /** Folder of the built client; served with an SPA fallback when it exists. */
  clientDir?: string;
}

export function createApp(deps: AppDeps): Express {
  const { dataSource, config } = deps;
  const clock = deps.clock ?? systemClock;
  const logger = deps.logger ?? pino({ level: config.env === 'test' ? 'silent' : config.logLevel });
  const app = express();
  if (config.trustProxy) app.set('trust proxy', 1);
  app.disable('x-powered-by');
  app.use(securityHeaders(config.trustProxy));
  app.use(pinoHttp({ logger, genReqId: (req) => (req.headers['x-request-id'] as string) || randomUUID(), autoLogging: config.env !== 'test' }));

  app.get('/api/health', (_req, res) => {
    res.json({ ok: true });
  });
  app.get('/api/openapi.json', (_req, res) => {
    res.json(buildOpenApiDocument());
  });

  const auth = configurePassport(dataSource);
  const users = createUserService(dataSource, clock);
  app.use('/api', express.json({ limit: '1mb' }), sessionMiddleware(dataSource, deps.sessionSecret, config.trustProxy), auth.initialize(), auth.session(), requireCsrf);
  app.use('/api/auth', authRoutes(auth, users, config.loginRateLimit));
  app.use('/api/users', userRoutes(users));
  app.use('/api/booths', masterDataRoutes({ resource: 'booth', read: 'booths:read', write: 'booths:write', createSchema: createBoothSchema, updateSchema: updateBoothSchema, service: createBoothService(dataSource, clock) }));
  app.use('/api/racks', masterDataRoutes({ resource: 'rack', read: 'racks:read', write: 'racks:write', createSchema: createRackSchema, updateSchema: updateRackSchema, service: createRackService(dataSource, clock) }));
  app.use('/api/settings', settingsRoutes(createSettingsService(dataSource, clock)));
  app.use('/api/audit', auditRoutes(dataSource));
  app.use('/api', apiNotFound);

  if (deps.clientDir && fs.existsSync(path.join(deps.clientDir, 'index.html'))) serveClient(app, deps.clientDir);
  app.use(errorHandler);
  return app;
}

function serveClient(app: Express, clientDir: string): void {
  app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
  // Every other path is a client route: the router in the browser decides what to show.
  app.get('/{*splat}', (_req, res) => {
    res.sendFile(path.join(clientDir, 'index.html'));
  });
}
