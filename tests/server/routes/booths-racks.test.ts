import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(async () => ctx.close());

const newBooth = { name: 'Test booth', kind: 'down-draft', volumeM3: 60, extractionM3PerH: 18000 };
const newRack = { name: 'Test rack', shelves: 12, shelfAreaM2: 1 };

describe('GET /api/booths', () => {
  it('lists the demo booths in the list shape for every role', async () => {
    for (const email of Object.values(demo)) {
      const { agent } = await signIn(ctx.app, email);
      const res = await agent.get('/api/booths').expect(200);
      expect(res.body).toMatchObject({ page: 1, pageSize: 50 });
      expect(res.body.total).toBeGreaterThanOrEqual(2);
      expect(res.body.items[0]).toHaveProperty('clearanceMin');
    }
  });

  it('answers 401 without a sign-in', async () => {
    await request(ctx.app).get('/api/booths').expect(401);
  });
});

describe('POST /api/booths', () => {
  it('lets a lead and an admin create a booth with defaults filled in', async () => {
    for (const email of [demo.lead, demo.admin]) {
      const { agent, csrf } = await signIn(ctx.app, email);
      const res = await agent.post('/api/booths').set('x-csrf-token', csrf).send(newBooth).expect(201);
      expect(res.body.booth).toMatchObject({ ...newBooth, mixingFactorK: 3, measuredClearanceMin: null, clearanceSource: 'computed' });
      await agent.get(`/api/booths/${res.body.booth.id}`).expect(200);
    }
  });

  it('answers 403 to a sprayer and an assembler', async () => {
    for (const email of [demo.sprayer, demo.assembler]) {
      const { agent, csrf } = await signIn(ctx.app, email);
      const res = await agent.post('/api/booths').set('x-csrf-token', csrf).send(newBooth).expect(403);
      expect(res.body.error.code).toBe('forbidden');
    }
  });

  it('answers 400 naming each bad field', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent
      .post('/api/booths')
      .set('x-csrf-token', csrf)
      .send({ name: '', kind: 'tent', volumeM3: -3, extractionM3PerH: 'lots', mixingFactorK: 12 })
      .expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['extractionM3PerH', 'kind', 'mixingFactorK', 'name', 'volumeM3']);
  });

  it('answers 400 for a body that is not JSON, not 500', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent.post('/api/booths').set('x-csrf-token', csrf).set('content-type', 'application/json').send('{"name":').expect(400);
    expect(res.body.error.code).toBe('bad_request');
  });
});

describe('PATCH /api/booths/:id', () => {
  it('changes only the fields sent, uses a measured clearance time and records the change', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const created = await agent.post('/api/booths').set('x-csrf-token', csrf).send({ ...newBooth, mixingFactorK: 6 }).expect(201);
    const res = await agent.patch(`/api/booths/${created.body.booth.id}`).set('x-csrf-token', csrf).send({ measuredClearanceMin: 4 }).expect(200);
    expect(res.body.booth).toMatchObject({ mixingFactorK: 6, measuredClearanceMin: 4, clearanceMin: 4, clearanceSource: 'measured' });
    const audit = await agent.get('/api/audit').expect(200);
    expect(audit.body.items[0]).toMatchObject({ entity: 'booth', action: 'update', userName: 'Dev Okafor' });
  });

  it('answers 404 for a booth that does not exist and 400 for an id that is not a number', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const missing = await agent.patch('/api/booths/99999').set('x-csrf-token', csrf).send({ name: 'x' }).expect(404);
    expect(missing.body.error.code).toBe('not_found');
    await agent.get('/api/booths/abc').expect(400);
  });
});

describe('racks', () => {
  it('lets a lead create and change a rack, and computes its total area', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent.post('/api/racks').set('x-csrf-token', csrf).send(newRack).expect(201);
    expect(res.body.rack).toMatchObject({ ...newRack, location: 'drying-room', dryingTempC: null, totalAreaM2: 12 });
    const patched = await agent.patch(`/api/racks/${res.body.rack.id}`).set('x-csrf-token', csrf).send({ dryingTempC: 25 }).expect(200);
    expect(patched.body.rack).toMatchObject({ shelves: 12, dryingTempC: 25 });
  });

  it('lets a sprayer and an assembler read racks but not write them', async () => {
    for (const email of [demo.sprayer, demo.assembler]) {
      const { agent, csrf } = await signIn(ctx.app, email);
      await agent.get('/api/racks').expect(200);
      await agent.post('/api/racks').set('x-csrf-token', csrf).send(newRack).expect(403);
      await agent.patch('/api/racks/1').set('x-csrf-token', csrf).send({ shelves: 2 }).expect(403);
    }
  });

  it('answers 400 with fields for shelves that are not whole', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.admin);
    const res = await agent.post('/api/racks').set('x-csrf-token', csrf).send({ ...newRack, shelves: 2.5, dryingTempC: 200 }).expect(400);
    expect(res.body.error.fields).toHaveProperty('shelves');
    expect(res.body.error.fields).toHaveProperty('dryingTempC');
  });
});

describe('the rest of /api', () => {
  it('answers health without a sign-in', async () => {
    const res = await request(ctx.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ ok: true });
  });

  it('answers an unknown API route with a 404 envelope', async () => {
    const { agent } = await signIn(ctx.app, demo.lead);
    const res = await agent.get('/api/no-such-thing').expect(404);
    expect(res.body.error).toMatchObject({ code: 'not_found' });
  });

  it('publishes an OpenAPI document with the booth schema', async () => {
    const res = await request(ctx.app).get('/api/openapi.json').expect(200);
    expect(res.body.openapi).toMatch(/^3\./);
    const post = res.body.paths['/api/booths'].post;
    expect(post.requestBody.content['application/json'].schema.required).toEqual(expect.arrayContaining(['name', 'kind', 'volumeM3', 'extractionM3PerH']));
  });
});

describe('names that show nothing', () => {
  it('refuses a booth or rack named only with zero-width and other invisible characters, and trims them from real names', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const booth = await agent.post('/api/booths').set('x-csrf-token', csrf).send({ ...newBooth, name: '\u200B\u200B\u200B' }).expect(400);
    expect(booth.body.error.fields.name).toBe('Enter a name');
    const rack = await agent.post('/api/racks').set('x-csrf-token', csrf).send({ ...newRack, name: '\u200D\uFEFF\u2800' }).expect(400);
    expect(rack.body.error.fields.name).toBe('Enter a name');
    const trimmed = await agent.post('/api/racks').set('x-csrf-token', csrf).send({ ...newRack, name: '\u200BRack Ø\uFEFF' }).expect(201);
    expect(trimmed.body.rack.name).toBe('Rack Ø');
  });
});
