import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../server/app';
import { csrfFor, demo, signIn, startTestApp, testSecret, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let admin: SignedIn;
beforeAll(async () => {
  ctx = await startTestApp();
  admin = await signIn(ctx.app, demo.admin);
});
afterAll(async () => ctx.close());

const addUser = (email: string, password: string) => admin.agent.post('/api/users').set('x-csrf-token', admin.csrf).send({ email, name: 'Kit Arden', role: 'sprayer', password });

describe('a password reset by an admin', () => {
  it('ends every sign-in the user had, and only the new password works', async () => {
    const created = await addUser('kit.arden@larchmere.test', 'first-password-for-kit').expect(201);
    const onTablet = await signIn(ctx.app, 'kit.arden@larchmere.test', 'first-password-for-kit');
    const onPhone = await signIn(ctx.app, 'kit.arden@larchmere.test', 'first-password-for-kit');
    await admin.agent.patch(`/api/users/${created.body.user.id}`).set('x-csrf-token', admin.csrf).send({ password: 'second-password-for-kit' }).expect(200);
    await onTablet.agent.get('/api/auth/me').expect(401);
    await onPhone.agent.get('/api/auth/me').expect(401);
    const csrf = await csrfFor(onTablet.agent);
    await onTablet.agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: 'kit.arden@larchmere.test', password: 'first-password-for-kit' }).expect(401);
    const again = await signIn(ctx.app, 'kit.arden@larchmere.test', 'second-password-for-kit');
    await again.agent.get('/api/auth/me').expect(200);
  });

  it('keeps the admin’s own sign-in when they reset their own password, and ends their others', async () => {
    const created = await addUser('second.owner@larchmere.test', 'owner-two-first-pass').expect(201);
    await admin.agent.patch(`/api/users/${created.body.user.id}`).set('x-csrf-token', admin.csrf).send({ role: 'admin' }).expect(200);
    const here = await signIn(ctx.app, 'second.owner@larchmere.test', 'owner-two-first-pass');
    const elsewhere = await signIn(ctx.app, 'second.owner@larchmere.test', 'owner-two-first-pass');
    await here.agent.patch(`/api/users/${created.body.user.id}`).set('x-csrf-token', here.csrf).send({ password: 'owner-two-second-pass' }).expect(200);
    await here.agent.get('/api/auth/me').expect(200);
    await elsewhere.agent.get('/api/auth/me').expect(401);
  });
});

describe('passwords that are too easy to guess', () => {
  it.each([
    ['password12', /commonly used password/],
    ['1234567890', /hundred most common passwords/],
    ['aaaaaaaaaa', /Repeated characters/],
    ['arden2026!', /person’s name or e-mail/],
  ])('refuses %s with a field-level reason when a user is added or a password reset', async (password, reason) => {
    const added = await addUser(`weak.${Date.now()}@larchmere.test`, password).expect(400);
    expect(added.body.error).toMatchObject({ code: 'validation_failed', fields: { password: expect.stringMatching(reason) } });
    const sprayer = (await admin.agent.get('/api/users?pageSize=200')).body.items.find((u: { email: string }) => u.email === 'kit.arden@larchmere.test');
    const reset = await admin.agent.patch(`/api/users/${sprayer.id}`).set('x-csrf-token', admin.csrf).send({ password }).expect(400);
    expect(reset.body.error.fields.password).toMatch(reason);
  });
});

describe('failed sign-ins to one account', () => {
  const attempt = async (email: string, password: string) => {
    const agent = request.agent(ctx.app);
    const csrf = await csrfFor(agent);
    return agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email, password });
  };

  it('make that account wait after five, even for the right password, while other accounts sign in', async () => {
    await addUser('locked.out@larchmere.test', 'right-password-here').expect(201);
    const statuses = [];
    for (let i = 0; i < 5; i++) statuses.push((await attempt('locked.out@larchmere.test', `wrong-${i}`)).status);
    expect(statuses).toEqual([401, 401, 401, 401, 401]);
    const refused = await attempt('Locked.Out@larchmere.test', 'right-password-here');
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toMatch(/this account; wait 5 minutes/);
    expect((await attempt(demo.lead, 'finish-demo-2026')).status).toBe(200);
  });

  it('treat an unknown e-mail the same, so the limit tells nobody who has an account', async () => {
    for (let i = 0; i < 5; i++) expect((await attempt('nobody@larchmere.test', `wrong-${i}`)).status).toBe(401);
    expect((await attempt('nobody@larchmere.test', 'wrong')).status).toBe(429);
  });

  it('start again from nothing after a successful sign-in', async () => {
    await addUser('forgetful@larchmere.test', 'forgetful-right-one').expect(201);
    for (let i = 0; i < 4; i++) expect((await attempt('forgetful@larchmere.test', `wrong-${i}`)).status).toBe(401);
    expect((await attempt('forgetful@larchmere.test', 'forgetful-right-one')).status).toBe(200);
    for (let i = 0; i < 4; i++) expect((await attempt('forgetful@larchmere.test', `wrong-again-${i}`)).status).toBe(401);
    expect((await attempt('forgetful@larchmere.test', 'forgetful-right-one')).status).toBe(200);
  });
});

describe('GET /api/events stream limits', () => {
  let server: http.Server;
  let port: number;
  const open: http.ClientRequest[] = [];
  beforeAll(async () => {
    const app = createApp({ dataSource: ctx.dataSource, config: { ...ctx.config, liveStreams: { perUser: 2, perServer: 3 } }, signInSecret: testSecret });
    server = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    port = (server.address() as AddressInfo).port;
  });
  afterAll(async () => {
    for (const req of open) req.destroy();
    server.closeAllConnections();
    await new Promise((resolve) => server.close(resolve));
  });

  async function cookieOf(email: string): Promise<string> {
    const agent = request.agent(ctx.app);
    const csrf = await csrfFor(agent);
    const res = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email, password: 'finish-demo-2026' }).expect(200);
    return (res.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
  }

  /** Opens a stream; resolves with its status and, when refused, the error body. */
  function stream(cookie: string): Promise<{ status: number; body: string; req: http.ClientRequest }> {
    return new Promise((resolve, reject) => {
      const req = http.get({ host: '127.0.0.1', port, path: '/api/events', headers: { cookie } }, (res) => {
        if (res.statusCode === 200) return resolve({ status: 200, body: '', req });
        let body = '';
        res.on('data', (chunk) => (body += chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body, req }));
      });
      req.on('error', reject);
      open.push(req);
    });
  }

  it('refuses a third stream for one user and the fourth on the server with 429, and frees a place when a stream closes', async () => {
    const lead = await cookieOf(demo.lead);
    const first = await stream(lead);
    expect((await stream(lead)).status).toBe(200);
    const third = await stream(lead);
    expect(third.status).toBe(429);
    expect(JSON.parse(third.body).error.message).toMatch(/already have 2 live-update streams open/);

    const sprayer = await cookieOf(demo.sprayer);
    expect((await stream(sprayer)).status).toBe(200);
    const overServer = await stream(await cookieOf(demo.assembler));
    expect(overServer.status).toBe(429);
    expect(JSON.parse(overServer.body).error.message).toMatch(/server already serves its 3 live-update streams/);

    const closed = new Promise((resolve) => first.req.once('close', resolve));
    first.req.destroy();
    await closed;
    // The server notices the closed connection on its own turn of the event loop.
    let again = await stream(lead);
    for (let i = 0; again.status !== 200 && i < 20; i++) {
      await new Promise((resolve) => setTimeout(resolve, 25));
      again = await stream(lead);
    }
    expect(again.status).toBe(200);
  });
});
