import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

// A tablet that was offline sends its writes later: the server's clock has moved on when the repeat comes.
const clock = {
  at: new Date('2027-03-02T09:30:00Z'),
  now() {
    return this.at;
  },
};

let ctx: TestContext;
let lead: SignedIn;
let sprayer: SignedIn;
let sessionId: number;
let otherSessionId: number;
let partId: number;
let primerId: number;

const checks = {
  extractionRunning: true,
  filtersChecked: true,
  faceVelocityMps: 0.55,
  respiratorFitted: true,
  respiratorKind: 'air-fed',
  airTempC: 20,
  relativeHumidityPct: 50,
  surfaceTempC: 19,
};
const patch = (id: number, body: object) =>
  sprayer.agent.patch(`/api/spray-sessions/${id}`).set('x-csrf-token', sprayer.csrf).send(body);
const post = (url: string, body: object) => sprayer.agent.post(url).set('x-csrf-token', sprayer.csrf).send(body);
const book = async (start: string, end: string) =>
  (
    await lead.agent
      .post('/api/spray-sessions')
      .set('x-csrf-token', lead.csrf)
      .send({ boothId: 1, start, end, sprayerId: 3, items: [{ partId, stepPosition: 0 }] })
      .expect(201)
  ).body.spraySession.id as number;

beforeAll(async () => {
  ctx = await startTestApp({ clock });
  [lead, sprayer] = await Promise.all([signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer)]);
  const job = (await lead.agent.get('/api/jobs?q=LJ-26-105')).body.items[0];
  partId = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items[0].id;
  primerId = (await lead.agent.get('/api/products?q=PU Primer')).body.items[0].id;
  sessionId = await book('2027-03-02T09:00:00Z', '2027-03-02T11:00:00Z');
  otherSessionId = await book('2027-03-02T13:00:00Z', '2027-03-02T14:00:00Z');
});
afterAll(async () => ctx?.close());

describe('a spray session change sent again with its idempotency key', () => {
  it('answers the checks and the start as the first time, at the time the tablet gave', async () => {
    const body = {
      checklist: checks,
      state: 'spraying',
      changedAt: '2027-03-02T09:20:00Z',
      idempotencyKey: 'start-key-0001',
    };
    const first = await patch(sessionId, body).expect(200);
    expect(first.body.spraySession).toMatchObject({
      state: 'spraying',
      checklist: { completedAt: '2027-03-02T09:20:00.000Z' },
    });
    clock.at = new Date('2027-03-02T10:00:00Z');
    const again = await patch(sessionId, body).expect(200);
    expect(again.body).toEqual(first.body);
  });

  it('stops spraying once: the repeat does not restart the clearance countdown', async () => {
    const body = { state: 'clearing', changedAt: '2027-03-02T09:50:00Z', idempotencyKey: 'stop-key-0001' };
    const first = await patch(sessionId, body).expect(200);
    expect(first.body.spraySession).toMatchObject({ state: 'clearing', clearingStartedAt: '2027-03-02T09:50:00.000Z' });
    await lead.agent
      .patch(`/api/spray-sessions/${sessionId}`)
      .set('x-csrf-token', lead.csrf)
      .send({ notes: 'Changed after the stop' })
      .expect(200);
    clock.at = new Date('2027-03-02T10:05:00Z');
    const again = await patch(sessionId, body).expect(200);
    // The first answer, not today's session: the note written since is not in it, and nothing was changed.
    expect(again.body).toEqual(first.body);
    const now = (await lead.agent.get(`/api/spray-sessions/${sessionId}`).expect(200)).body.spraySession;
    expect(now).toMatchObject({ notes: 'Changed after the stop', clearingStartedAt: '2027-03-02T09:50:00.000Z' });
  });

  it('refuses a key already used on another session', async () => {
    const res = await patch(otherSessionId, { state: 'checking', idempotencyKey: 'stop-key-0001' }).expect(409);
    expect(res.body.error.fields).toEqual({ idempotencyKey: 'Send a new key' });
  });

  it('refuses a change too long ago and a key too short, naming the field', async () => {
    expect(
      (await patch(otherSessionId, { state: 'checking', changedAt: '2026-10-01T09:00:00Z' }).expect(400)).body.error
        .fields,
    ).toHaveProperty('changedAt');
    expect(
      (await patch(otherSessionId, { state: 'checking', idempotencyKey: 'short' }).expect(400)).body.error.fields,
    ).toHaveProperty('idempotencyKey');
  });
});

describe('a mix sent again with its idempotency key', () => {
  it('answers 200 with the pot already recorded and records no second pot', async () => {
    const body = {
      productId: primerId,
      wantedL: 2,
      thinningPct: 5,
      tempC: 20,
      mixedAt: '2027-03-02T09:25:00Z',
      idempotencyKey: 'mix-key-0001',
    };
    const first = await post(`/api/spray-sessions/${sessionId}/mixes`, body).expect(201);
    const again = await post(`/api/spray-sessions/${sessionId}/mixes`, body).expect(200);
    expect(again.body).toEqual(first.body);
    const mixes = (await sprayer.agent.get(`/api/spray-sessions/${sessionId}/mixes`).expect(200)).body.items;
    expect(mixes.map((mix: { id: number }) => mix.id)).toEqual([first.body.mix.id]);
  });

  it('makes a second pot for a new key', async () => {
    await post(`/api/spray-sessions/${sessionId}/mixes`, {
      productId: primerId,
      wantedL: 1,
      tempC: 20,
      idempotencyKey: 'mix-key-0002',
    }).expect(201);
    expect((await sprayer.agent.get(`/api/spray-sessions/${sessionId}/mixes`).expect(200)).body.items).toHaveLength(2);
  });
});

describe('a denib sent again with its idempotency key', () => {
  it('answers 200 with the denib already recorded and records no second denib', async () => {
    const body = {
      spraySessionId: sessionId,
      partIds: [partId],
      grit: 'P320',
      abradedAt: '2027-03-02T09:40:00Z',
      idempotencyKey: 'denib-key-0001',
    };
    const first = await post('/api/denibs', body).expect(201);
    clock.at = new Date('2027-03-02T10:10:00Z');
    const again = await post('/api/denibs', body).expect(200);
    expect(again.body).toEqual(first.body);
    const denibs = (await sprayer.agent.get(`/api/denibs?spraySessionId=${sessionId}`).expect(200)).body;
    expect(denibs.total).toBe(1);
  });

  it('answers a resend with the first denib whatever the rest of the body says', async () => {
    const res = await post('/api/denibs', {
      spraySessionId: otherSessionId,
      partIds: [partId],
      grit: 'P320',
      abradedAt: '2027-03-02T10:00:00Z',
      idempotencyKey: 'denib-key-0001',
    }).expect(200);
    // The key names the first denib: the resend is answered with it whatever the body says.
    expect(res.body.denib.spraySessionId).toBe(sessionId);
  });
});
