import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
let sprayer: SignedIn;
let sessionId: number;
let topcoatId: number;
let partId: number;

const goodChecklist = { extractionRunning: true, filtersChecked: true, faceVelocityMps: 0.55, respiratorFitted: true, respiratorKind: 'air-fed', airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 };

beforeAll(async () => {
  ctx = await startTestApp({ clock: { now: () => new Date('2027-03-02T16:30:00Z') } });
  lead = await signIn(ctx.app, demo.lead);
  sprayer = await signIn(ctx.app, demo.sprayer);
  const job = (await lead.agent.get('/api/jobs?q=LJ-26-105')).body.items[0];
  partId = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items[0].id;
  topcoatId = (await lead.agent.get('/api/products?q=Topcoat Satin')).body.items.find((p: { name: string }) => p.name.includes('PU')).id;
  const session = await lead.agent
    .post('/api/spray-sessions')
    .set('x-csrf-token', lead.csrf)
    .send({ boothId: 1, start: '2027-03-02T09:00:00Z', end: '2027-03-02T11:00:00Z', sprayerId: 3, items: [{ partId, stepPosition: 0 }] })
    .expect(201);
  sessionId = session.body.spraySession.id;
});
afterAll(async () => ctx.close());

const patch = (who: SignedIn, body: object) => who.agent.patch(`/api/spray-sessions/${sessionId}`).set('x-csrf-token', who.csrf).send(body);

describe('the pre-spray checklist', () => {
  it('blocks spraying until the checklist is done', async () => {
    const res = await patch(sprayer, { state: 'spraying' }).expect(409);
    expect(res.body.error.message).toMatch(/checklist/);
  });

  it('says stop when the mask is not the one the products need, and blocks the sprayer', async () => {
    // The planned step is the demo 2K PU primer, which contains isocyanate: air-fed protection.
    const res = await patch(sprayer, { checklist: { ...goodChecklist, respiratorKind: 'vapour-and-particulate' } }).expect(200);
    expect(res.body.spraySession.checklist.verdict).toBe('stop');
    expect(res.body.spraySession.checklist.problems.join(' ')).toMatch(/These products need air-fed protection; a respirator with vapour and particulate filters is not enough\./);
    await patch(sprayer, { state: 'spraying' }).expect(409);
    await patch(sprayer, { checklist: { ...goodChecklist, respiratorKind: 'vapour-and-particulate', overrideReason: 'I say so' } }).expect(403);
  });

  it('lets a lead override a stop with a recorded reason', async () => {
    const stop = { ...goodChecklist, relativeHumidityPct: 90, overrideReason: 'Dehumidifier on, sealer coat only' };
    const res = await patch(lead, { checklist: stop, state: 'spraying' }).expect(200);
    expect(res.body.spraySession).toMatchObject({ state: 'spraying', checklist: { verdict: 'stop', overrideReason: 'Dehumidifier on, sealer coat only', completedByName: 'Dev Okafor' } });
  });

  it('starts the clearance countdown when spraying stops', async () => {
    const res = await patch(sprayer, { state: 'clearing' }).expect(200);
    expect(res.body.spraySession.clearingStartedAt).toMatch(/^\d{4}-/);
  });
});

describe('mixes', () => {
  it('works out each component from the ratio and the pot life from the temperature', async () => {
    const res = await sprayer.agent
      .post(`/api/spray-sessions/${sessionId}/mixes`)
      .set('x-csrf-token', sprayer.csrf)
      .send({ productId: topcoatId, wantedL: 2.2, thinningPct: 10, tempC: 13, mixedAt: '2027-03-02T09:00:00Z' })
      .expect(201);
    const mix = res.body.mix;
    // 4 : 1 with 10 % thinner on the mix: 2.2 L = base × (1 + 0.25 + 0.125) → base 1.6, hardener 0.4, thinner 0.2 (worked by hand).
    expect(mix.baseL).toBeCloseTo(1.6, 6);
    expect(mix.hardenerL).toBeCloseTo(0.4, 6);
    expect(mix.thinnerL).toBeCloseTo(0.2, 6);
    // Pot life 180 min at the data sheet's 23 °C row; at 13 °C the 10 °C rule (common practice, no published source) doubles it: 360 min.
    expect(mix.potLifeEndsAt).toBe('2027-03-02T15:00:00.000Z');
  });

  it('flags a coat sprayed from a pot past its pot life', async () => {
    const mixes = await sprayer.agent.get(`/api/spray-sessions/${sessionId}/mixes`).expect(200);
    const mixId = mixes.body.items[0].id;
    const coat = await sprayer.agent
      .post('/api/coats')
      .set('x-csrf-token', sprayer.csrf)
      .send({ spraySessionId: sessionId, partIds: [partId], productId: topcoatId, mixId, sprayedAt: '2027-03-02T16:00:00Z', airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 })
      .expect(201);
    expect(coat.body.coat.warnings.map((w: { code: string }) => w.code)).toContain('pot-life-expired');
  });
});
