import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(async () => ctx.close());

describe('POST /api/readings', () => {
  it('takes a typed reading from a sprayer and works out the dew point', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.sprayer);
    const res = await agent.post('/api/readings').set('x-csrf-token', csrf).send({ boothId: 1, airTempC: 30, relativeHumidityPct: 55 }).expect(201);
    // Published worked value: 30 °C and 55 % RH give a dew point of 20 °C (coatings maker's glossary, "Dew point").
    expect(res.body.reading.dewPointC).toBeCloseTo(20, 0);
    expect(res.body.reading.source).toBe('typed');
  });

  it('takes a reading from a booth sensor with its bearer token, and only for its own booth', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const issued = await agent.post('/api/booths/2/sensor-token').set('x-csrf-token', csrf).expect(201);
    const token = issued.body.token as string;
    const ok = await request(ctx.app).post('/api/readings').set('Authorization', `Bearer ${token}`).send({ boothId: 2, airTempC: 18.5, relativeHumidityPct: 62, surfaceTempC: 17 }).expect(201);
    expect(ok.body.reading).toMatchObject({ boothId: 2, source: 'sensor' });
    await request(ctx.app).post('/api/readings').set('Authorization', `Bearer ${token}`).send({ boothId: 1, airTempC: 18, relativeHumidityPct: 60 }).expect(403);
    await request(ctx.app).post('/api/readings').set('Authorization', 'Bearer not-a-token').send({ boothId: 2, airTempC: 18, relativeHumidityPct: 60 }).expect(401);
    // The token works only for readings, not as a key to the rest of the API.
    await request(ctx.app).get('/api/booths').set('Authorization', `Bearer ${token}`).expect(401);
  });

  it('answers 400 when neither booth nor rack is named, and 403 to an anonymous post without a token', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.sprayer);
    const res = await agent.post('/api/readings').set('x-csrf-token', csrf).send({ airTempC: 20, relativeHumidityPct: 50 }).expect(400);
    expect(res.body.error.fields).toHaveProperty('boothId');
    await request(ctx.app).post('/api/readings').send({ boothId: 1, airTempC: 20, relativeHumidityPct: 50 }).expect(403);
  });
});

describe('GET /api/events', () => {
  it('streams a change to a signed-in user as it happens', async () => {
    const lead = await signIn(ctx.app, demo.lead);
    const cookie = (await lead.agent.get('/api/auth/me')).request.cookies;
    const server = ctx.app.listen(0);
    const { port } = server.address() as AddressInfo;
    const controller = new AbortController();
    try {
      const response = await fetch(`http://127.0.0.1:${port}/api/events`, { headers: { cookie }, signal: controller.signal });
      expect(response.headers.get('content-type')).toContain('text/event-stream');
      const reader = response.body!.getReader();
      await lead.agent.post('/api/spray-sessions').set('x-csrf-token', lead.csrf).send({ boothId: 1, start: '2027-06-07T09:00:00Z', end: '2027-06-07T10:00:00Z' }).expect(201);
      let text = '';
      while (!text.includes('spray-session.changed')) text += new TextDecoder().decode((await reader.read()).value);
      expect(text).toContain('event: change');
    } finally {
      controller.abort();
      server.close();
    }
  });

  it('answers 401 without a sign-in', async () => {
    await request(ctx.app).get('/api/events').expect(401);
  });
});
