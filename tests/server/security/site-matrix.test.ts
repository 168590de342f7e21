import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can } from '../../../shared/permissions';
import { apiRoutes } from '../../../server/registry/api-routes';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';
import { signedOutAgent } from './fixtures';
import { routeKey } from './route-table';
import { errorBodyProblems, send } from './send';
import { createSiteFixtures, type SiteFixtures } from './site-fixtures';
import { siteRoles, siteTable, type Attempt, type FirstSite, type SiteRole, type SiteRow } from './site-table';

let ctx: TestContext;
let fx: SiteFixtures;

beforeAll(async () => {
  ctx = await startTestApp();
  fx = await createSiteFixtures(ctx.app);
});
afterAll(async () => ctx.close());

const routeOf = (row: SiteRow) => apiRoutes.find((route) => routeKey(route.method, route.path) === routeKey(row.method, row.path))!;

function allowed(row: SiteRow, who: SiteRole): boolean {
  const access = routeOf(row).access;
  const permission = typeof access === 'object' ? access.sensorOr : access;
  return permission === 'public' || permission === 'signed-in' || can(who, permission);
}

async function agentFor(who: SiteRole, spec: { url: string; ownAgent?: boolean }): Promise<SignedIn> {
  if (!spec.ownAgent) return fx.people[who];
  return spec.url.endsWith('/login') ? signedOutAgent(ctx.app) : signIn(ctx.app, `${who}.second@larchmere.test`, 'second-site-2026');
}

/** The first site's things, looked up by the admin just before a list is checked. */
async function firstSite(): Promise<FirstSite> {
  const ids = async (url: string) => ((await fx.admin.agent.get(url).expect(200)).body.items as { id: number }[]).map((item) => item.id);
  return {
    booths: await ids('/api/booths?siteId=1&pageSize=200'),
    racks: await ids('/api/racks?siteId=1&pageSize=200'),
    users: await ids('/api/users?siteId=1&pageSize=200'),
    spraySessions: await ids('/api/spray-sessions?siteId=1&pageSize=1000'),
  };
}

function refusal(attempt: Attempt, res: { status: number; body: { error?: { fields?: Record<string, string> } } }): string | null {
  if (res.status === 403 || res.status === 404) return null;
  const named = Object.keys(res.body.error?.fields ?? {});
  if (res.status === 400 && attempt.fields?.some((field) => named.includes(field))) return null;
  return `${attempt.url} answered ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`;
}

/** Everything wrong with one route tried as one role of the second site; empty when it keeps to its site. */
async function problemsOf(row: SiteRow, who: SiteRole): Promise<string[]> {
  const control = await row.control(fx, who);
  const controlRes = await send(await agentFor(who, control), row.method, control);
  const problems = errorBodyProblems(controlRes);
  if (!allowed(row, who)) return controlRes.status === 403 ? problems : [...problems, `control answered ${controlRes.status} to a role without the permission`];
  if (controlRes.status >= 300) problems.push(`the same-site control answered ${controlRes.status}: ${JSON.stringify(controlRes.body).slice(0, 300)}`);
  const other = row.other;
  if (other.kind === 'refused') {
    for (const attempt of await other.attempts(fx, who)) {
      const res = await send(fx.people[who], row.method, attempt);
      problems.push(...errorBodyProblems(res), ...[refusal(attempt, res)].filter((p): p is string => p !== null));
    }
  }
  if (other.kind === 'filtered') {
    const res = await send(fx.people[who], row.method, other.attempt(fx, who));
    if (res.status >= 300) problems.push(`the other site’s list answered ${res.status}`);
    else problems.push(...other.leaks(res.body, fx, await firstSite()));
  }
  return problems;
}

describe('the site table', () => {
  it('has a row for every route of the registry, and none for a route it does not have', () => {
    const registry = apiRoutes.map((route) => routeKey(route.method, route.path));
    const tabled = siteTable.map((row) => routeKey(row.method, row.path));
    expect(new Set(tabled).size, 'one row per route').toBe(tabled.length);
    expect(registry.filter((key) => !tabled.includes(key)), 'routes without a row').toEqual([]);
    expect(tabled.filter((key) => !registry.includes(key)), 'rows without a route').toEqual([]);
  });

  it('agrees with each route’s declared reach: a site route is refused or filtered, a group or own route is not', () => {
    const expected = { site: ['refused', 'filtered', 'stream'], group: ['group'], own: ['own'] };
    for (const row of siteTable) expect(expected[routeOf(row).sites], routeKey(row.method, row.path)).toContain(row.other.kind);
  });
});

describe('every route as the lead, sprayer and assembler of another site', () => {
  it.each(siteTable.map((row) => [routeKey(row.method, row.path), row] as const))('%s keeps to the caller’s site', async (_key, row) => {
    const found: Record<string, string[]> = {};
    for (const who of siteRoles) found[who] = await problemsOf(row, who);
    expect(found).toEqual({ lead: [], sprayer: [], assembler: [] });
  });
});

describe('GET /api/today as the first site’s lead', () => {
  it('shows the things the second site’s board must not: the first site’s session now and the part waiting for its denib there', async () => {
    const lead = await signIn(ctx.app, demo.lead);
    const day = (await lead.agent.get('/api/today').expect(200)).body.today;
    expect(day.sessions.map((s: { id: number }) => s.id)).toContain(fx.today.first.spraySessionId);
    expect(day.sessions.map((s: { id: number }) => s.id)).not.toContain(fx.today.second.spraySessionId);
    expect(day.denibWaiting).toContainEqual(expect.objectContaining({ jobId: fx.today.denibJobId, partCount: 1, grit: 'P320' }));
  });
});

/** Signs in over HTTP and opens the change stream, collecting each `change` event. */
async function openStream(base: string, email: string, password: string) {
  const first = await fetch(`${base}/api/auth/csrf`);
  const token = ((await first.json()) as { token: string }).token;
  const preCookie = first.headers.get('set-cookie')!.split(';')[0];
  const login = await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { cookie: preCookie, 'x-csrf-token': token, 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  const cookie = login.headers.get('set-cookie')!.split(';')[0];
  const events: { type: string; id: number; siteId: number | null; boothId?: number | null }[] = [];
  const request = http.get(`${base}/api/events`, { headers: { cookie } });
  await new Promise<void>((resolve) =>
    request.on('response', (res) => {
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => {
        for (const line of chunk.split('\n')) if (line.startsWith('data: ')) events.push(JSON.parse(line.slice(6)));
      });
      resolve();
    }),
  );
  return { events, close: () => request.destroy() };
}

describe('GET /api/events as the lead of another site', () => {
  it('passes on the caller’s site’s changes and never the first site’s', async () => {
    const server = http.createServer(ctx.app).listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const stream = await openStream(base, 'lead.second@larchmere.test', 'second-site-2026');
    const reading = (boothId: number) => fx.admin.agent.post('/api/readings').set('x-csrf-token', fx.admin.csrf).send({ boothId, airTempC: 18, relativeHumidityPct: 60 }).expect(201);
    await reading(fx.first.boothId);
    await fx.admin.agent.post('/api/coats').set('x-csrf-token', fx.admin.csrf).send(await fx.coatBody(fx.first)).expect(201);
    const denib = async (side: typeof fx.first) =>
      (await fx.admin.agent.post('/api/denibs').set('x-csrf-token', fx.admin.csrf).send({ spraySessionId: side.spraySessionId, partIds: [side.placedPartId], grit: 'P320', abradedAt: new Date().toISOString() }).expect(201)).body.denib.id as number;
    const firstDenib = await denib(fx.first);
    const secondDenib = await denib(fx.second);
    await reading(fx.second.boothId);
    for (let tries = 0; tries < 100 && !stream.events.some((e) => e.boothId === fx.second.boothId); tries++) await new Promise((resolve) => setTimeout(resolve, 20));
    stream.close();
    await new Promise((resolve) => server.close(resolve));
    expect(stream.events.some((e) => e.type === 'reading.created' && e.boothId === fx.second.boothId)).toBe(true);
    expect(stream.events.filter((e) => e.siteId === fx.first.siteId)).toEqual([]);
    expect(stream.events.filter((e) => e.type === 'denib.created').map((e) => e.id)).toEqual([secondDenib]);
    expect(stream.events.some((e) => e.id === firstDenib && e.type === 'denib.created')).toBe(false);
  });
});
