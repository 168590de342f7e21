import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
const clock = { at: new Date('2027-03-02T08:00:00Z'), now() { return this.at; } };

beforeAll(async () => {
  ctx = await startTestApp({ clock });
  lead = await signIn(ctx.app, demo.lead);
});
afterAll(async () => ctx.close());

describe('parts sprayed in a session without being planned', () => {
  it('count in what the session did, without being added to its plan', async () => {
    const job = (await lead.agent.get('/api/jobs?q=LJ-26-102')).body.items[0];
    const parts: { id: number }[] = (await lead.agent.get(`/api/jobs/${job.id}/parts?pageSize=10`)).body.items;
    const sealerId = (await lead.agent.get('/api/products?q=Sanding Sealer')).body.items[0].id;
    const booked = await lead.agent
      .post('/api/spray-sessions')
      .set('x-csrf-token', lead.csrf)
      .send({ boothId: 1, start: '2027-03-02T09:00:00Z', end: '2027-03-02T11:00:00Z', items: [{ partId: parts[0].id, stepPosition: 0 }] })
      .expect(201);
    const sessionId = booked.body.spraySession.id;
    clock.at = new Date('2027-03-02T10:00:00Z');
    // The planned part and two the sprayer added in the booth, in one coat.
    await lead.agent
      .post('/api/coats')
      .set('x-csrf-token', lead.csrf)
      .send({ spraySessionId: sessionId, partIds: parts.slice(0, 3).map((p) => p.id), productId: sealerId, sprayedAt: clock.at.toISOString(), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 })
      .expect(201);

    const session = (await lead.agent.get(`/api/spray-sessions/${sessionId}`).expect(200)).body.spraySession;
    expect(session.items).toEqual([{ partId: parts[0].id, stepPosition: 0, sprayedAt: clock.at.toISOString() }]);
    expect(session.work).toMatchObject({ partCount: 3, sprayedCount: 3 });
    expect(session.work.coats).toEqual([expect.objectContaining({ jobReference: 'LJ-26-102', coatNumber: 1, partCount: 3, sprayedCount: 3 })]);
  });
});
