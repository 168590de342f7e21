import type { Request, RequestHandler, Response } from 'express';
import helmet from 'helmet';

/** Only our own origin: the built client, its self-hosted fonts and inline styles the calendar and charts set. */
function helmetFor(behindHttpsProxy: boolean): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: true,
      directives: {
        'default-src': ["'self'"],
        'script-src': ["'self'"],
        'style-src': ["'self'", "'unsafe-inline'"],
        'font-src': ["'self'", 'data:'],
        'img-src': ["'self'", 'data:', 'blob:'],
        'connect-src': ["'self'"],
        'media-src': ["'self'", 'blob:'],
        'worker-src': ["'self'", 'blob:'],
        // Plain HTTP on the workshop network must keep working; upgrade only behind HTTPS.
        'upgrade-insecure-requests': behindHttpsProxy ? [] : null,
      },
    },
  }) as RequestHandler;
}

/** What helmet sets and removes: the same for every request (no nonces), so worked out once. */
function headersOf(middleware: RequestHandler): { set: [string, string | string[]][]; removed: string[] } {
  const set: [string, string | string[]][] = [];
  const removed: string[] = [];
  const res = { setHeader: (name: string, value: string | string[]) => set.push([name, value]), removeHeader: (name: string) => removed.push(name) };
  let done = false;
  void middleware({ headers: {} } as Request, res as unknown as Response, () => (done = true));
  if (!done) throw new Error('helmet did not finish synchronously; its headers cannot be worked out once');
  return { set, removed };
}

export function securityHeaders(behindHttpsProxy: boolean): RequestHandler {
  const { set, removed } = headersOf(helmetFor(behindHttpsProxy));
  return (_req, res, next) => {
    for (const name of removed) res.removeHeader(name);
    for (const [name, value] of set) res.setHeader(name, value);
    next();
  };
}
