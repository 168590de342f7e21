import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can, roles, type Permission } from '../../../shared/permissions';
import { apiRoutes } from '../../../server/registry/api-routes';
import type { ApiRoute } from '../../../server/registry/route';
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

const registryKeys = apiRoutes.map((route) => routeKey(route.method, route.path));
const routeOf = (key: string) => apiRoutes.find((route) => routeKey(route.method, route.path) === key)!;

/** What a role needs for the route, as the registry declares it; a sensor token is another way in, not a role. */
const permissionOf = (route: ApiRoute): Permission | 'public' | 'signed-in' => (typeof route.access === 'object' ? route.access.sensorOr : route.access);

describe('the route table', () => {
  it('declares each route of the registry once', () => {
    expect(new Set(registryKeys).size, 'one declaration per route').toBe(registryKeys.length);
  });

  it('holds every route the app answers: nothing is mounted outside the registry', () => {
    const mounted = registeredRoutes(ctx.app);
    expect(mounted.filter((key) => !registryKeys.includes(key)), 'mounted but not in the registry').toEqual([]);
    expect(registryKeys.filter((key) => !mounted.includes(key)), 'in the registry but not mounted').toEqual([]);
  });

  it('has a row for every route of the registry, and none for a route it does not have', () => {
    const tabled = routeTable.map((row) => routeKey(row.method, row.path));
    expect(new Set(tabled).size, 'one row per route').toBe(tabled.length);
    expect(registryKeys.filter((key) => !tabled.includes(key)), 'routes without a row').toEqual([]);
    expect(tabled.filter((key) => !registryKeys.includes(key)), 'rows without a route').toEqual([]);
  });

  it('agrees with the permission matrix: 401 signed out, 403 exactly for roles without the permission', () => {
    for (const row of routeTable) {
      const key = routeKey(row.method, row.path);
      const permission = permissionOf(routeOf(key));
      if (permission === 'public') {
        expect(audiences.filter((a) => [401, 403].includes(row.expected[a])), key).toEqual([]);
        continue;
      }
      expect(row.expected.signedOut, key).toBe(401);
      for (const role of roles) {
        const allowed = permission === 'signed-in' || can(role, permission);
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
