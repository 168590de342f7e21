import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import pino, { type Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { buildApiRouter, buildBareApiRouter } from './api';
import { configurePassport } from './auth/passport';
import type { AppConfig } from './config/env';
import { systemClock, type Clock } from './lib/clock';
import { LiveStreamLimits } from './lib/live-stream-limits';
import { ResponseCache } from './lib/response-cache';
import { signInCacheFor } from './auth/sign-in-cache';
import { errorHandler } from './middleware/error-handler';
import { requestLog } from './middleware/request-log';
import { securityHeaders } from './middleware/security';
import { signInSessionMiddleware } from './middleware/sign-in-session';
import { runAsOwnWork } from './db/sqlite-gate';
import { AnswerShortcuts } from './registry/answer-shortcuts';
import type { RegistryDeps } from './registry/mount';
import { EventBus } from './services/events';
import { createFileStorage } from './services/file-storage';
import type { NotificationRuntime } from './mail/notifications-runtime';

export interface AppDeps {
  dataSource: DataSource;
  config: AppConfig;
  signInSecret: string;
  clock?: Clock;
  logger?: Logger;
  /** The change feed behind GET /api/events; tests pass their own to listen in. */
  events?: EventBus;
  /** E-mail and its scheduler; started by the process entry, or by a test that wants them. */
  notifications?: NotificationRuntime;
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
  app.use(requestLog(logger, config.slowRequestMs));

  const events = deps.events ?? new EventBus();
  const signInCache = signInCacheFor(events);
  const auth = configurePassport(dataSource, signInCache);
  const services = { clock, events, liveStreams: new LiveStreamLimits(config.liveStreams), storage: createFileStorage(config), notifications: deps.notifications };
  const answers = answerCache(events, config, clock);
  const shortcuts = new AnswerShortcuts(signInCache, answers);
  // A repeat read is answered from memory before any of the rest; it touches no database.
  app.use('/api', shortcuts.lane);
  // Each request is its own piece of work: on SQLite none of its queries may run inside another request's transaction.
  app.use((_req, _res, next) => runAsOwnWork(next));
  const registry: RegistryDeps = { dataSource, config, services, auth, answers, shortcuts };
  app.use('/api', buildBareApiRouter(registry));
  app.use('/api', express.json({ limit: '1mb' }), signInSessionMiddleware(dataSource, deps.signInSecret, config.trustProxy, signInCache), auth.initialize(), auth.session());
  app.use('/api', buildApiRouter(registry));

  if (deps.clientDir && fs.existsSync(path.join(deps.clientDir, 'index.html'))) serveClient(app, deps.clientDir);
  app.use(errorHandler);
  return app;
}

/** The response cache, cleared by every change on the feed (a sign-in's own comings and goings change no answer). */
function answerCache(events: EventBus, config: AppConfig, clock: Clock): ResponseCache {
  const answers = new ResponseCache(config.responseCacheBytes, () => clock.now().getTime());
  events.subscribe((event) => {
    if (event.type !== 'sign-in.changed') answers.clear(event.siteId);
  });
  return answers;
}

/** The service worker and the manifest are asked for afresh each time, so a new deploy reaches the tablets. */
function keepWorkerFresh(res: express.Response, filePath: string): void {
  if (/(^|[/\\])(sw\.js|manifest\.webmanifest)$/.test(filePath)) res.setHeader('Cache-Control', 'no-cache');
}

function serveClient(app: Express, clientDir: string): void {
  app.use(express.static(clientDir, { index: false, maxAge: '1h', setHeaders: keepWorkerFresh }));
  // Every other path is a client route: the router in the browser decides what to show.
  app.get('/{*splat}', (_req, res) => {
    res.sendFile(path.join(clientDir, 'index.html'));
  });
}
