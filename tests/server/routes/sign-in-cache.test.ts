import { once } from 'node:events';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../server/app';
import { UserEntity } from '../../../server/db/entities/user.entity';
import { demoPassword } from '../../../server/db/seed';
import { EventBus, type ChangeEvent } from '../../../server/services/events';
import { csrfFor, demo, signIn, startTestApp, testSecret, type TestContext } from '../../helpers/test-app';

// Two app instances on one database sharing one change feed, as two processes behind a load
// balancer share theirs through PostgreSQL: each keeps signed-in sessions and users in memory,
// and a change made on one must count on the other from the very next request.
let ctx: TestContext;
let bus: EventBus;
let a: Express;
let b: Express;
const heard: ChangeEvent[] = [];

beforeAll(async () => {
  ctx = await startTestApp();
  bus = new EventBus();
  bus.subscribe((event) => heard.push(event));
  const build = () => createApp({ dataSource: ctx.dataSource, config: ctx.config, signInSecret: testSecret, events: bus });
  [a, b] = [build(), build()];
});
afterAll(async () => ctx.close());

/** Signs in on instance A; the cookie and CSRF token then go to either instance. */
async function signInOnA(email: string, password = demoPassword): Promise<{ cookie: string; csrf: string }> {
  const agent = request.agent(a);
  const csrf = await csrfFor(agent);
  const login = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email, password }).expect(200);
  return { cookie: String(login.headers['set-cookie']?.[0] ?? '').split(';')[0], csrf };
}

const idOf = async (email: string) => (await ctx.dataSource.getRepository(UserEntity).findOneByOrFail({ email })).id;
const me = (app: Express, cookie: string) => request(app).get('/api/auth/me').set('Cookie', cookie);

describe('signed-in sessions and users held in memory', () => {
  it('ends a sign-in on the other instance as soon as it signs out on one', async () => {
    const session = await signInOnA(demo.sprayer);
    await me(b, session.cookie).expect(200);
    await me(a, session.cookie).expect(200);
    await request(a).post('/api/auth/logout').set('Cookie', session.cookie).set('x-csrf-token', session.csrf).expect(204);
    await me(b, session.cookie).expect(401);
    await me(a, session.cookie).expect(401);
  });

  it('stops a user disabled on one instance at their next request on the other', async () => {
    const assembler = await signInOnA(demo.assembler);
    await me(b, assembler.cookie).expect(200);
    const admin = await signIn(a, demo.admin);
    const id = await idOf(demo.assembler);
    await admin.agent.patch(`/api/users/${id}`).set('x-csrf-token', admin.csrf).send({ disabled: true }).expect(200);
    await me(b, assembler.cookie).expect(401);
    await admin.agent.patch(`/api/users/${id}`).set('x-csrf-token', admin.csrf).send({ disabled: false }).expect(200);
  });

  it('applies a role change made on one instance to the next request on the other', async () => {
    const admin = await signIn(a, demo.admin);
    await admin.agent.post('/api/users').set('x-csrf-token', admin.csrf).send({ email: 'rolechange@larchmere.test', name: 'Role Change', role: 'assembler', password: 'a-long-password' }).expect(201);
    const person = await signInOnA('rolechange@larchmere.test', 'a-long-password');
    // The audit log is the lead's to read, not the assembler's.
    await request(b).get('/api/audit').set('Cookie', person.cookie).expect(403);
    expect((await me(b, person.cookie).expect(200)).body.user.role).toBe('assembler');
    await admin.agent.patch(`/api/users/${await idOf('rolechange@larchmere.test')}`).set('x-csrf-token', admin.csrf).send({ role: 'lead', name: 'Role Changed' }).expect(200);
    const after = await me(b, person.cookie).expect(200);
    expect(after.body.user).toMatchObject({ role: 'lead', name: 'Role Changed' });
    await request(b).get('/api/audit').set('Cookie', person.cookie).expect(200);
  });

  it('ends older sign-ins on the other instance when the password is reset', async () => {
    const lead = await signInOnA(demo.lead);
    await me(b, lead.cookie).expect(200);
    const admin = await signIn(a, demo.admin);
    await admin.agent.patch(`/api/users/${await idOf(demo.lead)}`).set('x-csrf-token', admin.csrf).send({ password: 'a-new-long-password-for-the-lead' }).expect(200);
    await me(b, lead.cookie).expect(401);
    await me(a, lead.cookie).expect(401);
    await signInOnA(demo.lead, 'a-new-long-password-for-the-lead');
  });

  it('shows a user’s own preference change on the other instance at once', async () => {
    const assembler = await signInOnA(demo.assembler);
    expect((await me(b, assembler.cookie).expect(200)).body.user.units).toBe('metric');
    await request(a).patch('/api/auth/me').set('Cookie', assembler.cookie).set('x-csrf-token', assembler.csrf).send({ units: 'us' }).expect(200);
    expect((await me(b, assembler.cookie).expect(200)).body.user.units).toBe('us');
  });

  it('tells the instances, never the browsers, about these changes', async () => {
    const sprayer = await signInOnA(demo.sprayer);
    const server = http.createServer(b).listen(0, '127.0.0.1');
    await once(server, 'listening');
    let text = '';
    const stream = http.get(`http://127.0.0.1:${(server.address() as AddressInfo).port}/api/events`, { headers: { cookie: sprayer.cookie } }, (res) => res.on('data', (chunk: Buffer) => (text += chunk.toString())));
    try {
      for (let tries = 0; tries < 100 && !text.includes('retry'); tries++) await new Promise((resolve) => setTimeout(resolve, 20));
      heard.length = 0;
      await request(a).patch('/api/auth/me').set('Cookie', sprayer.cookie).set('x-csrf-token', sprayer.csrf).send({ units: 'us' }).expect(200);
      bus.publish({ type: 'part.changed', id: 1, siteId: null });
      for (let tries = 0; tries < 100 && !text.includes('part.changed'); tries++) await new Promise((resolve) => setTimeout(resolve, 20));
    } finally {
      stream.destroy();
      server.close();
    }
    expect(heard.map((e) => e.type)).toContain('user.changed');
    expect(text).toContain('part.changed');
    expect(text).not.toContain('user.changed');
    expect(text).not.toContain('sign-in.changed');
  });
});

// A repeat of the same cached read with the same cookie is answered before the sign-in session is
// read (server/registry/answer-shortcuts.ts). Such an answer sets no cookie (the full way renews
// the rolling one), which is how these tests know which way it went.
describe('repeat reads answered before the sign-in session', () => {
  const report = '/api/reports/booth-use?from=2025-03-24&to=2025-04-06';
  const read = (app: Express, cookie: string) => request(app).get(report).set('Cookie', cookie);
  const shortcutTaken = (res: request.Response) => res.headers['set-cookie'] === undefined;

  /** A fresh lead, signed in on A, whose report read on B has just been answered the short way. */
  async function leadWithShortcut(email: string): Promise<{ cookie: string; csrf: string; id: number }> {
    const admin = await signIn(a, demo.admin);
    await admin.agent.post('/api/users').set('x-csrf-token', admin.csrf).send({ email, name: 'Short Way', role: 'lead', password: 'a-long-password' }).expect(201);
    const lead = await signInOnA(email, 'a-long-password');
    const first = await read(b, lead.cookie).expect(200);
    expect(shortcutTaken(first)).toBe(false);
    // B's first sight of the session renews its expiry once, after which the session stays as held.
    expect(shortcutTaken(await read(b, lead.cookie).expect(200))).toBe(false);
    const again = await read(b, lead.cookie).expect(200);
    expect(shortcutTaken(again)).toBe(true);
    expect(again.body).toEqual(first.body);
    return { ...lead, id: await idOf(email) };
  }

  async function changeUser(id: number, patch: Record<string, unknown>): Promise<void> {
    const admin = await signIn(a, demo.admin);
    await admin.agent.patch(`/api/users/${id}`).set('x-csrf-token', admin.csrf).send(patch).expect(200);
  }

  it('takes the short way only for the same cookie and address', async () => {
    const lead = await leadWithShortcut('short-same@larchmere.test');
    const other = await signInOnA(demo.admin);
    expect(shortcutTaken(await read(b, other.cookie).expect(200))).toBe(false);
    const elsewhere = await request(b).get(`${report}&boothId=1`).set('Cookie', lead.cookie);
    expect(shortcutTaken(elsewhere)).toBe(false);
    const forged = lead.cookie.replace(/.$/, (last) => (last === 'A' ? 'B' : 'A'));
    await read(b, forged).expect(401);
  });

  it('refuses the next repeat read once the role no longer allows it', async () => {
    const lead = await leadWithShortcut('short-role@larchmere.test');
    await changeUser(lead.id, { role: 'assembler' });
    await read(b, lead.cookie).expect(403);
  });

  it('refuses the next repeat read once the user is disabled, signed out or has a new password', async () => {
    const disabled = await leadWithShortcut('short-disabled@larchmere.test');
    await changeUser(disabled.id, { disabled: true });
    await read(b, disabled.cookie).expect(401);

    const out = await leadWithShortcut('short-out@larchmere.test');
    await request(a).post('/api/auth/logout').set('Cookie', out.cookie).set('x-csrf-token', out.csrf).expect(204);
    await read(b, out.cookie).expect(401);

    const reset = await leadWithShortcut('short-reset@larchmere.test');
    await changeUser(reset.id, { password: 'another-long-password-here' });
    await read(b, reset.cookie).expect(401);
  });

  it('answers a write since the last read afresh, never from before it', async () => {
    const lead = await leadWithShortcut('short-fresh@larchmere.test');
    bus.publish({ type: 'answers.stale', siteId: null });
    expect(shortcutTaken(await read(b, lead.cookie).expect(200))).toBe(false);
  });
});

