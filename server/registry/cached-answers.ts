import { createHash } from 'node:crypto';
import { promisify } from 'node:util';
import { brotliCompress, constants, gzip } from 'node:zlib';
import type { Request, Response } from 'express';
import type { SiteScope } from '../lib/site-scope';
import type { CachedAnswer, ClearedBy } from '../lib/response-cache';
import type { CachePolicy, RouteContext } from './route';

/**
 * The longest a clock-dependent answer is kept. Every state change in such an answer happens at an
 * instant the answer carries (a handle time, a recoat window, a session's end, a job's ready time),
 * and the entry expires at the first of those still to come, so no state is shown late. What this
 * bounds is the estimates worked out from "now" for work not yet done (a part's expected pack time
 * while coats remain), which the screens show to the minute: a quarter of a minute keeps them true
 * to the minute shown.
 */
export const clockBoundMs = 15_000;

/**
 * The longest any answer is kept. Every write through the app clears what it touches at once on
 * every instance; this only bounds changes made behind the app's back (SQL by hand, the CLI).
 */
export const cacheBoundMs = 60_000;

/** The answer's JSON bytes and their strong ETag (a hash of exactly those bytes). */
export function toCachedAnswer(answer: unknown): CachedAnswer {
  const body = Buffer.from(JSON.stringify(answer));
  return { body, etag: `"${createHash('sha1').update(body).digest('base64url')}"` };
}

// Below about one network packet compressing saves nothing worth the work.
const compressFromBytes = 1400;
const gzipAsync = promisify(gzip);
const brotliAsync = promisify(brotliCompress);

/**
 * The two encodings offered, each made once per answer (in libuv's thread pool, so a big board
 * never holds the event loop). Brotli at quality 6 makes a ready board a third smaller than gzip
 * does, in about the same time; browsers ask for it over HTTPS, gzip over plain HTTP.
 */
const encodings = {
  br: {
    etagSuffix: '-br',
    make: (answer: CachedAnswer) => (answer.brotli ??= brotliAsync(answer.body, { params: { [constants.BROTLI_PARAM_QUALITY]: 6, [constants.BROTLI_PARAM_SIZE_HINT]: answer.body.length } })),
  },
  gzip: { etagSuffix: '-gz', make: (answer: CachedAnswer) => (answer.gzipped ??= gzipAsync(answer.body, { level: 6 })) },
};

/** The encoding to send: brotli when the client takes it, else gzip, else none (no Accept-Encoding at all: nothing assumed). */
function encodingFor(req: Request): keyof typeof encodings | null {
  if (!req.headers['accept-encoding']) return null;
  if (req.acceptsEncodings('br') === 'br') return 'br';
  return req.acceptsEncodings('gzip', 'identity') === 'gzip' ? 'gzip' : null;
}

/**
 * Sends the answer with its ETag, compressed when it is big and the client accepts brotli or gzip
 * (every browser does). The compressed bytes are kept with a cached answer, so a wall screen's
 * board is compressed once per change, not once per request. Each encoding has its own strong
 * ETag, as HTTP asks. Express answers 304 without the body when the request's If-None-Match names
 * it (req.fresh), whether or not the answer came from the cache.
 */
export async function sendAnswer(req: Request, res: Response, status: number, answer: CachedAnswer): Promise<void> {
  // Browsers keep it but ask again each time, sending the ETag: a signed-in answer is never shared.
  res.setHeader('Cache-Control', 'private, no-cache');
  res.setHeader('Vary', 'Accept-Encoding');
  const encoding = answer.body.length < compressFromBytes ? null : encodingFor(req);
  if (!encoding) {
    res.setHeader('ETag', answer.etag);
    return void res.status(status).type('json').send(answer.body);
  }
  const { etagSuffix, make } = encodings[encoding];
  const body = await make(answer);
  res.setHeader('ETag', `${answer.etag.slice(0, -1)}${etagSuffix}"`);
  res.setHeader('Content-Encoding', encoding);
  res.status(status).type('json').send(body);
}

/** The cache key: who is asking (site scope, role, and the user when the answer is theirs) and the address. */
export function answerKey(
  policy: CachePolicy,
  req: Request,
  { scope, user, sensor }: Pick<RouteContext, 'scope' | 'user' | 'sensor'>,
): string {
  const sites = `${scope.allSites ? 'all' : 'one'}:${scope.siteId ?? '*'}:${scope.homeSiteId}`;
  const who = user ? user.role : sensor ? `sensor:${sensor.boothId}` : 'anonymous';
  const person = policy.perUser ? `:${user?.id ?? '-'}` : '';
  return `${sites}|${who}${person}|${req.originalUrl}`;
}

/** Which changes clear an answer given to this scope. */
export function clearedByOf(policy: CachePolicy, scope: SiteScope): ClearedBy {
  if (policy.clearedBy === 'any') return 'any';
  if (!scope.allSites) return scope.homeSiteId;
  return scope.siteId ?? 'any';
}

/** The site whose cached answers a write through this route may change: a non-admin's own site on a site route, else every site (null). */
export function staleSiteOf(sites: 'site' | 'group' | 'own', scope: SiteScope): number | null {
  return sites === 'site' && !scope.allSites ? scope.homeSiteId : null;
}

// An ISO 8601 instant as the API writes them (date-only values are days, not moments, and are skipped).
const instantPattern = /^\d{4}-\d\d-\d\dT\d\d:\d\d(:\d\d(\.\d+)?)?(Z|[+-]\d\d:?\d\d)$/;

/** The earliest instant in the answer that is still to come (Infinity when none is). */
export function nextInstantAfter(value: unknown, nowMs: number): number {
  if (typeof value === 'string') {
    if (value.length < 16 || value.charCodeAt(10) !== 84 /* T */ || !instantPattern.test(value)) return Infinity;
    const at = Date.parse(value);
    return at > nowMs ? at : Infinity;
  }
  if (!value || typeof value !== 'object') return Infinity;
  let earliest = Infinity;
  for (const inner of Array.isArray(value) ? value : Object.values(value))
    earliest = Math.min(earliest, nextInstantAfter(inner, nowMs));
  return earliest;
}

/** Until when an answer may be served from the cache. */
export function keepUntil(policy: CachePolicy, answer: unknown, nowMs: number): number {
  if (!policy.clock) return nowMs + cacheBoundMs;
  return Math.min(nowMs + clockBoundMs, nextInstantAfter(answer, nowMs));
}
