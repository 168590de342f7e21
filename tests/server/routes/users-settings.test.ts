import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(async () => ctx.close());

describe('/api/users', () => {
  it('lets an admin create a user who can then sign in', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.admin);
    const res = await agent
      .post('/api/users')
      .set('x-csrf-token', csrf)
      .send({ email: 'Second.Sprayer@Larchmere.test', name: 'Second Sprayer', role: 'sprayer', password: 'a-long-password' })
      .expect(201);
    expect(res.body.user).toMatchObject({ email: 'second.sprayer@larchmere.test', role: 'sprayer', disabled: false });
    await signIn(ctx.app, 'second.sprayer@larchmere.test', 'a-long-password');
  });

  it('answers 409 for an e-mail already in use', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.admin);
    const res = await agent.post('/api/users').set('x-csrf-token', csrf).send({ email: demo.lead, name: 'Dup', role: 'lead', password: 'a-long-password' }).expect(409);
    expect(res.body.error.fields).toHaveProperty('email');
  });

  it('disables a user so their session stops and they cannot sign in again', async () => {
    const admin = await signIn(ctx.app, demo.admin);
    const created = await admin.agent.post('/api/users').set('x-csrf-token', admin.csrf).send({ email: 'temp@larchmere.test', name: 'Temp', role: 'assembler', password: 'a-long-password' }).expect(201);
    const temp = await signIn(ctx.app, 'temp@larchmere.test', 'a-long-password');
    await admin.agent.patch(`/api/users/${created.body.user.id}`).set('x-csrf-token', admin.csrf).send({ disabled: true }).expect(200);
    await temp.agent.get('/api/auth/me').expect(401);
    const again = await temp.agent.post('/api/auth/login').set('x-csrf-token', temp.csrf).send({ email: 'temp@larchmere.test', password: 'a-long-password' });
    expect(again.status).toBe(401);
  });

  it('refuses to let an admin disable themselves', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.admin);
    const me = await agent.get('/api/auth/me');
    await agent.patch(`/api/users/${me.body.user.id}`).set('x-csrf-token', csrf).send({ disabled: true }).expect(409);
  });

  it('answers 403 to every role but admin', async () => {
    for (const email of [demo.lead, demo.sprayer, demo.assembler]) {
      const { agent, csrf } = await signIn(ctx.app, email);
      await agent.get('/api/users').expect(403);
      await agent.post('/api/users').set('x-csrf-token', csrf).send({}).expect(403);
    }
  });
});

describe('/api/settings', () => {
  it('shows the demo shop to every role and lets only the admin change it', async () => {
    const sprayer = await signIn(ctx.app, demo.sprayer);
    const res = await sprayer.agent.get('/api/settings').expect(200);
    expect(res.body.settings).toMatchObject({ shopName: 'Larchmere Joinery', timezone: 'Europe/London' });
    await sprayer.agent.patch('/api/settings').set('x-csrf-token', sprayer.csrf).send({ setupMin: 5 }).expect(403);
    const admin = await signIn(ctx.app, demo.admin);
    const changed = await admin.agent.patch('/api/settings').set('x-csrf-token', admin.csrf).send({ setupMin: 5 }).expect(200);
    expect(changed.body.settings).toMatchObject({ setupMin: 5, shopName: 'Larchmere Joinery' });
  });

  it('answers 400 for an unknown timezone', async () => {
    const admin = await signIn(ctx.app, demo.admin);
    const res = await admin.agent.patch('/api/settings').set('x-csrf-token', admin.csrf).send({ timezone: 'Mars/Olympus' }).expect(400);
    expect(res.body.error.fields.timezone).toBe('Unknown timezone');
  });

  it('keeps the shop’s locale and currency (en-GB and GBP until changed), refusing ones that do not exist', async () => {
    const admin = await signIn(ctx.app, demo.admin);
    expect((await admin.agent.get('/api/settings').expect(200)).body.settings).toMatchObject({ locale: 'en-GB', currency: 'GBP' });
    const changed = await admin.agent.patch('/api/settings').set('x-csrf-token', admin.csrf).send({ locale: 'de-DE', currency: 'EUR' }).expect(200);
    expect(changed.body.settings).toMatchObject({ locale: 'de-DE', currency: 'EUR' });
    const bad = await admin.agent.patch('/api/settings').set('x-csrf-token', admin.csrf).send({ locale: 'not a locale!', currency: 'XYZ1' }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['currency', 'locale']);
    await admin.agent.patch('/api/settings').set('x-csrf-token', admin.csrf).send({ locale: 'en-GB', currency: 'GBP' }).expect(200);
  });
});
