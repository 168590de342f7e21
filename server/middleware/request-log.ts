import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';
import type { Logger } from 'pino';

/**
 * Gives each request an id (the caller's `x-request-id` or a new one) and a logger, made only
 * when something is logged, and logs a request only when it failed on our side (5xx) or was
 * slow: logging every request cost more than many reads do.
 */
export function requestLog(logger: Logger, slowMs: number): RequestHandler {
  return (req, res, next) => {
    const started = performance.now();
    const header = req.headers['x-request-id'];
    req.id = typeof header === 'string' && header ? header : randomUUID();
    let child: Logger | undefined;
    Object.defineProperty(req, 'log', { configurable: true, enumerable: false, get: () => (child ??= logger.child({ reqId: req.id })) });
    res.on('finish', () => {
      const ms = Math.round(performance.now() - started);
      if (res.statusCode < 500 && ms < slowMs) return;
      const entry = { req: { method: req.method, url: req.originalUrl }, res: { statusCode: res.statusCode }, responseTime: ms };
      if (res.statusCode >= 500) req.log.error(entry, 'request failed');
      else req.log.warn(entry, 'slow request');
    });
    next();
  };
}
