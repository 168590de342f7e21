import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can, roles } from '../../../shared/permissions';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';
import { createFixtures, signedOutAgent, type Fixtures } from './fixtures';
import { audiences, demoEmails, registeredRoutes, routeKey, routeTable, type Audience } from './route-table';
import { errorBodyProblems, send } from './send';

let ctx: TestContext;
let fx: Fixtures;
const agents = {} as Record<Audience, SignedIn>;

beforeAll(async () => {
  ctx = await startTestApp();
  agents.signedOut = await signedOutAgent(ctx.app);
  for (const role of roles) agents[role] = await signIn(ctx.app, demo[role]);
  fx = await createFixtures(ctx.app, agents.admin);
});
afterAll(async () => ctx.close());

async function agentFor(audience: Audience, spec: { ownAgent?: boolean }): Promise<SignedIn> {
  if (!spec.ownAgent) return agents[audience];
  return audience === 'signedOut' ? signedOutAgent(ctx.app) : signIn(ctx.app, demoEmails[audience]);
}

describe('the route table', () => {
  it('has a row for every route the API router answers, and none for a route it does not', () => {
    const registered = registeredRoutes(ctx.app);
    const tabled = routeTable.map((row) => routeKey(row.method, row.path));
    expect(new Set(tabled).size, 'one row per route').toBe(tabled.length);
    expect(registered.filter((key) => !tabled.includes(key)), 'routes without a row').toEqual([]);
    expect(tabled.filter((key) => !registered.includes(key)), 'rows without a route').toEqual([]);
  });

  it('covers every operation of the OpenAPI document', async () => {
    const doc = (await agents.signedOut.agent.get('/api/openapi.json').expect(200)).body as { paths: Record<string, Record<string, unknown>> };
    const documented = Object.entries(doc.paths).flatMap(([path, ops]) => Object.keys(ops).map((method) => routeKey(method, path.replace(/\{(\w+)\}/g, ':$1'))));
    const tabled = routeTable.map((row) => routeKey(row.method, row.path));
    expect(documented.filter((key) => !tabled.includes(key))).toEqual([]);
  });

  it('agrees with the permission matrix: 401 signed out, 403 exactly for roles without the permission', () => {
    for (const row of routeTable) {
      const key = routeKey(row.method, row.path);
      if (row.permission === 'public') {
        expect(audiences.filter((a) => [401, 403].includes(row.expected[a])), key).toEqual([]);
        continue;
      }
      expect(row.expected.signedOut, key).toBe(401);
      for (const role of roles) {
        const allowed = row.permission === 'signed-in' || can(role, row.permission);
        expect(row.expected[role] === 403, `${key} as ${role}`).toBe(!allowed);
        if (allowed && row.expected[role] >= 300) expect(row.note, `${key}: say why ${role} gets ${row.expected[role]}`).toBeTruthy();
      }
    }
  });
});

describe('every route × every role', () => {
  it.each(routeTable.map((row) => [routeKey(row.method, row.path), row] as const))('%s answers each audience as the table says', async (_key, row) => {
    const actual = {} as Record<Audience, number>;
    const problems: string[] = [];
    for (const audience of audiences) {
      const spec = await row.request(fx, audience);
      const res = await send(await agentFor(audience, spec), row.method, spec);
      actual[audience] = res.status;
      problems.push(...errorBodyProblems(res).map((p) => `${audience}: ${p}`));
      if (res.status >= 400 && res.status !== row.expected[audience]) problems.push(`${audience}: ${JSON.stringify(res.body)}`);
    }
    expect({ statuses: actual, problems }).toEqual({ statuses: row.expected, problems: [] });
  });
});
