import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UserEntity } from '../../../server/db/entities/user.entity';
import { csrfFor, demo, signIn, startTestApp, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp({ loginRateLimit: 5 });
});
afterAll(async () => ctx.close());

describe('POST /api/auth/login', () => {
  it('signs a demo user in and returns who they are', async () => {
    const agent = request.agent(ctx.app);
    const csrf = await csrfFor(agent);
    const res = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: demo.lead, password: 'finish-demo-2026' }).expect(200);
    expect(res.body.user).toMatchObject({ email: demo.lead, role: 'lead', name: 'Dev Okafor' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = res.headers['set-cookie']?.[0] ?? '';
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('answers 401 with the envelope for a wrong password', async () => {
    const agent = request.agent(ctx.app);
    const csrf = await csrfFor(agent);
    const res = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: demo.lead, password: 'wrong' }).expect(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('answers 400 with fields for a body that is not an e-mail and password', async () => {
    const agent = request.agent(ctx.app);
    const csrf = await csrfFor(agent);
    const res = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: 'not-an-email' }).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['email', 'password']));
  });

  it('answers 403 when the CSRF token is missing', async () => {
    const res = await request(ctx.app).post('/api/auth/login').send({ email: demo.lead, password: 'finish-demo-2026' }).expect(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('keeps the CSRF token valid across sign-in so one token serves the whole visit', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    await agent.patch('/api/auth/me').set('x-csrf-token', csrf).send({ units: 'us' }).expect(200);
  });

  it('answers 429 after repeated failures from one address', async () => {
    const limited = ctx.restart();
    const agent = request.agent(limited);
    const csrf = await csrfFor(agent);
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) {
      const res = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: demo.sprayer, password: `bad-${i}` });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses[5]).toBe(429);
    const last = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: demo.sprayer, password: 'bad' });
    expect(last.body.error.message).toMatch(/wait/i);
  });
});

describe('GET /api/auth/me and sign-out', () => {
  it('answers 401 when nobody is signed in', async () => {
    const res = await request(ctx.app).get('/api/auth/me').expect(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('returns the user, then 401 after sign-out', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.sprayer);
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.user.role).toBe('sprayer');
    await agent.post('/api/auth/logout').set('x-csrf-token', csrf).expect(204);
    await agent.get('/api/auth/me').expect(401);
  });

  it('keeps a sign-in across an app restart on the same database', async () => {
    const { agent } = await signIn(ctx.app, demo.assembler);
    const cookie = (await agent.get('/api/auth/me')).request.cookies;
    const restarted = ctx.restart();
    const res = await request(restarted).get('/api/auth/me').set('Cookie', cookie).expect(200);
    expect(res.body.user.email).toBe(demo.assembler);
  });

  it('stops a disabled user’s existing session on their next request', async () => {
    const { agent } = await signIn(ctx.app, demo.assembler);
    await agent.get('/api/auth/me').expect(200);
    const admin = await signIn(ctx.app, demo.admin);
    const { id } = await ctx.dataSource.getRepository(UserEntity).findOneByOrFail({ email: demo.assembler });
    await admin.agent.patch(`/api/users/${id}`).set('x-csrf-token', admin.csrf).send({ disabled: true }).expect(200);
    await agent.get('/api/auth/me').expect(401);
    await admin.agent.patch(`/api/users/${id}`).set('x-csrf-token', admin.csrf).send({ disabled: false }).expect(200);
  });
});

describe('GET /api/auth/session', () => {
  it('answers 200 with no user for a visitor who has not signed in, so the sign-in page makes no refused request', async () => {
    const res = await request(ctx.app).get('/api/auth/session').expect(200);
    expect(res.body).toEqual({ user: null });
  });

  it('says who is signed in, and no one once they sign out', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.assembler);
    const signedIn = await agent.get('/api/auth/session').expect(200);
    expect(signedIn.body.user).toMatchObject({ email: demo.assembler, role: 'assembler' });
    expect(signedIn.body.user.passwordHash).toBeUndefined();
    await agent.post('/api/auth/logout').set('x-csrf-token', csrf).expect(204);
    expect((await agent.get('/api/auth/session').expect(200)).body).toEqual({ user: null });
  });
});
