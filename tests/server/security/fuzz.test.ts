import http from 'node:http';
import type { AddressInfo } from 'node:net';
import fc from 'fast-check';
import request, { type Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPassword } from '../../../server/db/seed';
import { demo, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';
import { createFixtures, pdfBytes, type Fixtures } from './fixtures';
import { brokenJson, fieldNames, hostileHeaders, hostileKeys, hostileQuery, hostileSegment, hostileString, hostileValue, ownKeys, plausibleNasty } from './hostile';
import { isMutating, routeKey, routeTable, type Method, type RequestSpec, type RouteRow } from './route-table';
import { errorBodyProblems } from './send';

// FUZZ_SEED=<n> replays a run; every property's seed is this plus the route's place in the table.
const baseSeed = Number(process.env.FUZZ_SEED ?? 20260909);
const runsPerWrite = 70;
const runsPerRead = 12;
const minimumRequests = 2000;

interface FuzzRequest {
  url: string;
  json?: unknown;
  raw?: { text: string; headers: Record<string, string> };
  form?: { fields: [string, string][]; files: { name: string; content: Buffer }[] };
}

let ctx: TestContext;
let server: http.Server;
let admin: SignedIn;
let fx: Fixtures;
let sent = 0;
const statusCounts = new Map<number, number>();
const prototypeKeys = Object.getOwnPropertyNames(Object.prototype).sort();

beforeAll(async () => {
  console.log(`fuzz seed ${baseSeed} (set FUZZ_SEED to replay)`);
  ctx = await startTestApp({ loginRateLimit: 100_000 });
  server = http.createServer(ctx.app).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  admin = await signInAdmin();
  fx = await createFixtures(ctx.app, admin);
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await ctx.close();
});

async function signInAdmin(): Promise<SignedIn> {
  const agent = request.agent(`http://127.0.0.1:${(server.address() as AddressInfo).port}`);
  const csrf = (await agent.get('/api/auth/csrf').expect(200)).body.token as string;
  await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: demo.admin, password: demoPassword }).expect(200);
  return { agent, csrf };
}

const withoutQuery = (url: string) => url.split('?')[0];

function urlArbitrary(row: RouteRow, base: RequestSpec): fc.Arbitrary<string> {
  const paths = row.path.includes(':') ? fc.oneof({ weight: 2, arbitrary: fc.constant(withoutQuery(base.url)) }, { weight: 3, arbitrary: hostileSegment.map((segment) => row.path.replace(/:\w+/, segment)) }) : fc.constant(base.url);
  return fc.tuple(paths, fc.option(hostileQuery, { freq: 2 })).map(([path, query]) => (query === null ? path : `${path}?${query}`));
}

function formArbitrary(base: RequestSpec): fc.Arbitrary<FuzzRequest['form']> {
  const names = fc.oneof(fc.constantFrom('kind', 'preview', 'mapping', 'file', ...hostileKeys.filter(Boolean)), fc.string({ minLength: 1, maxLength: 10 }));
  const values = fc.oneof(hostileString.filter((v) => v.length < 5000), hostileValue.map((v) => JSON.stringify(v) ?? ''), fc.constantFrom('tds', 'sds', 'true', '{"__proto__":{"polluted":"yes"}}', '{"label":"__proto__"}'));
  const file = fc.record({
    name: fc.constantFrom('sheet.pdf', '../../evil.pdf', 'a"b.pdf', 'مرحبا.pdf', '', 'x'.repeat(300), 'cut.csv'),
    content: fc.oneof(fc.constant(pdfBytes), fc.uint8Array({ maxLength: 2000 }).map((bytes) => Buffer.from(bytes)), fc.constant(Buffer.from('__proto__,constructor,label\n{"a":1},2,3\n'))),
  });
  return fc.record({
    fields: fc.array(fc.tuple(names.filter((n) => n !== 'file'), values), { maxLength: 5 }).map((pairs) => [...Object.entries(base.form?.fields ?? {}), ...pairs]),
    files: fc.array(file, { maxLength: 2 }),
  });
}

/** Every path to a leaf of a JSON value, arrays included: `[['sessions', 0, 'boothId'], …]`. */
function leafPaths(value: unknown, path: (string | number)[] = []): (string | number)[][] {
  if (Array.isArray(value)) return value.length ? value.flatMap((item, i) => leafPaths(item, [...path, i])) : [path];
  if (value && typeof value === 'object') {
    const entries = Object.entries(value);
    return entries.length ? entries.flatMap(([key, item]) => leafPaths(item, [...path, key])) : [path];
  }
  return [path];
}

/** A copy of `value` with the leaf at `path` replaced, keeping every other field valid. */
function setAt(value: unknown, path: (string | number)[], leaf: unknown): unknown {
  if (!path.length) return leaf;
  const [head, ...rest] = path;
  const source = (value ?? {}) as Record<string | number, unknown>;
  const copy = (Array.isArray(value) ? [...value] : { ...source }) as Record<string | number, unknown>;
  copy[head] = setAt(source[head], rest, leaf);
  return copy;
}

function bodyArbitrary(base: RequestSpec): fc.Arbitrary<Omit<FuzzRequest, 'url'>> {
  const valid = (base.body ?? {}) as Record<string, unknown>;
  const options: fc.WeightedArbitrary<Omit<FuzzRequest, 'url'>>[] = [
    { weight: 3, arbitrary: hostileValue.map((json) => ({ json })) },
    { weight: 2, arbitrary: fc.array(fc.tuple(fc.constantFrom(...hostileKeys), hostileValue), { minLength: 1, maxLength: 3 }).map((extra) => ({ json: ownKeys([...Object.entries(valid), ...extra]) })) },
    { weight: 1, arbitrary: brokenJson.map((text) => ({ raw: { text, headers: { 'content-type': 'application/json' } } })) },
    { weight: 1, arbitrary: hostileHeaders.map((headers) => ({ raw: { text: JSON.stringify(valid), headers } })) },
    { weight: 1, arbitrary: formArbitrary(base).map((form) => ({ form })) },
  ];
  const places = fc.oneof({ weight: 2, arbitrary: fc.constantFrom(...leafPaths(valid)) }, { weight: 1, arbitrary: fc.constantFrom(...fieldNames).map((name) => [name]) });
  const replacement = fc.oneof({ weight: 2, arbitrary: plausibleNasty }, { weight: 1, arbitrary: hostileValue });
  options.push({ weight: 6, arbitrary: fc.tuple(places, replacement).map(([path, value]) => ({ json: setAt(valid, path, value) })) });
  if (base.form) options.push({ weight: 4, arbitrary: formArbitrary(base).map((form) => ({ form })) });
  return fc.oneof(...options);
}

async function fire(method: Method, req: FuzzRequest): Promise<Response> {
  sent++;
  let call = admin.agent[method.toLowerCase() as 'post'](req.url).set('x-csrf-token', admin.csrf);
  if (req.raw) {
    for (const [name, value] of Object.entries(req.raw.headers)) call = call.set(name, value);
    return call.send(req.raw.text);
  }
  if (req.form) {
    for (const [name, value] of req.form.fields) call = call.field(name, value);
    for (const file of req.form.files) call = call.attach('file', file.content, file.name);
    return call;
  }
  return req.json === undefined ? call : call.type('json').send(JSON.stringify(req.json) ?? 'null');
}

function check(method: Method, req: FuzzRequest, res: Response): void {
  statusCounts.set(res.status, (statusCounts.get(res.status) ?? 0) + 1);
  const problems = res.status >= 500 ? [`answered ${res.status}: ${res.text.slice(0, 300)}`] : errorBodyProblems(res);
  const keys = Object.getOwnPropertyNames(Object.prototype).sort();
  if (keys.join() !== prototypeKeys.join() || ({} as Record<string, unknown>).polluted !== undefined) problems.push('Object.prototype was polluted');
  if (problems.length) throw new Error(`${method} ${req.url.slice(0, 200)}: ${problems.join('; ')}`);
}

const writes = routeTable.filter((row) => isMutating(row.method) && row.path !== '/api/auth/logout');
// The event stream never ends and ignores its query; the role matrix covers it.
const reads = routeTable.filter((row) => !isMutating(row.method) && row.path !== '/api/events');

function fuzzRoute(row: RouteRow, index: number, runs: number, withBody: boolean) {
  it(`${routeKey(row.method, row.path)} never answers 5xx and always with the envelope`, { timeout: 120_000 }, async () => {
    const base = await row.request(fx, 'admin');
    const body = withBody ? bodyArbitrary(base) : fc.constant({});
    const property = fc.asyncProperty(urlArbitrary(row, base), body, async (url, rest) => {
      const req = { url, ...rest };
      check(row.method, req, await fire(row.method, req));
    });
    await fc.assert(property, { seed: baseSeed + index, numRuns: runs });
    // A hostile request must never have cost the admin their session.
    await admin.agent.get('/api/auth/me').expect(200);
  });
}

describe('hostile requests to every mutating route, signed in as admin with the CSRF token', () => {
  writes.forEach((row, index) => fuzzRoute(row, index, runsPerWrite, true));
});

describe('hostile params and queries on every reading route', () => {
  reads.forEach((row, index) => fuzzRoute(row, 1000 + index, runsPerRead, false));
});

describe('the fuzz run', () => {
  it(`sent at least ${minimumRequests} requests to the mutating routes`, () => {
    expect(writes.length * runsPerWrite).toBeGreaterThanOrEqual(minimumRequests);
    expect(sent).toBeGreaterThanOrEqual(writes.length * runsPerWrite);
    console.log(`fuzz sent ${sent} requests (${writes.length} mutating routes × ${runsPerWrite}, ${reads.length} reading routes × ${runsPerRead})`);
    console.log(`answers: ${[...statusCounts].sort(([a], [b]) => a - b).map(([status, count]) => `${status}×${count}`).join(' ')}`);
  });
});
