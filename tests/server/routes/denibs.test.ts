import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

// The server's clock, moved by the tests: windows open and close as time passes.
const clock = { at: new Date('2027-03-01T09:00:00Z'), now() { return this.at; } };
const at = (iso: string) => (clock.at = new Date(iso));

let ctx: TestContext;
let lead: SignedIn;
let sprayer: SignedIn;
let assembler: SignedIn;
let sessionId: number;
let othersSessionId: number;
let jobId: number;
let doorA: number;
let doorB: number;
let primerId: number;
let topcoatId: number;

const post = (who: SignedIn, url: string, body: object) => who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const ready = async (partId: number) => (await lead.agent.get(`/api/ready?jobId=${jobId}`).expect(200)).body.items.find((p: { id: number }) => p.id === partId);
const coat = (partIds: number[], productId: number, sprayedAt: string, stepPosition?: number) =>
  post(sprayer, '/api/coats', { spraySessionId: sessionId, partIds, productId, sprayedAt, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19, ...(stepPosition === undefined ? {} : { stepPosition }) });

beforeAll(async () => {
  ctx = await startTestApp({ clock });
  [lead, sprayer, assembler] = await Promise.all([signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer), signIn(ctx.app, demo.assembler)]);
  const booth = await post(lead, '/api/booths', { name: 'Denib test booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201);
  const boothId = booth.body.booth.id;
  sessionId = (await post(lead, '/api/spray-sessions', { boothId, start: '2027-03-01T09:00:00Z', end: '2027-03-01T12:00:00Z', sprayerId: 3 }).expect(201)).body.spraySession.id;
  othersSessionId = (await post(lead, '/api/spray-sessions', { boothId, start: '2027-03-02T09:00:00Z', end: '2027-03-02T10:00:00Z' }).expect(201)).body.spraySession.id;
  // The demo's painted system: 2K PU primer, denib P320, two 2K PU topcoats.
  const vanity = (await lead.agent.get('/api/jobs?q=LJ-26-105').expect(200)).body.items[0];
  jobId = (await post(lead, '/api/jobs', { customer: 'Denib Test Ltd', reference: 'DN-1', dueDate: '2027-03-10', finishSystemId: vanity.finishSystemId }).expect(201)).body.job.id;
  doorA = (await post(lead, `/api/jobs/${jobId}/parts`, { label: 'Door A', lengthMm: 715, widthMm: 496, thicknessMm: 18 }).expect(201)).body.part.id;
  doorB = (await post(lead, `/api/jobs/${jobId}/parts`, { label: 'Door B', lengthMm: 715, widthMm: 496, thicknessMm: 18 }).expect(201)).body.part.id;
  primerId = (await lead.agent.get('/api/products?q=PU Primer')).body.items[0].id;
  topcoatId = (await lead.agent.get('/api/products?q=PU Topcoat')).body.items[0].id;
});
afterAll(async () => ctx?.close());

describe('POST /api/denibs', () => {
  it('clears "denib needed" on the parts it names, and only on those', async () => {
    await coat([doorA, doorB], primerId, '2027-03-01T09:15:00Z').expect(201);
    at('2027-03-01T09:30:00Z');
    expect(await ready(doorA)).toMatchObject({ abradeRequired: true, nextStep: 'Denib P320', nextStepKind: 'denib', nextStepGrit: 'P320', denibbedAt: null });

    at('2027-03-01T11:05:00Z');
    const res = await post(sprayer, '/api/denibs', { spraySessionId: sessionId, partIds: [doorA], grit: 'P320', abradedAt: '2027-03-01T11:00:00Z', notes: 'Faces and edges' }).expect(201);
    expect(res.body.denib).toMatchObject({ spraySessionId: sessionId, partIds: [doorA], grit: 'P320', abradedAt: '2027-03-01T11:00:00.000Z', notes: 'Faces and edges', recordedByName: 'Mina Castell', recordedAt: '2027-03-01T11:05:00.000Z' });
    // The primer's 20 °C row: recoat opens 120 min after 09:15. After the denib no closing time applies.
    expect(await ready(doorA)).toMatchObject({ abradeRequired: false, nextStep: 'Coat 2 of 3 at 40 µm dry', nextStepKind: 'coat', nextStepDryFilmUm: 40, nextWindowOpensAt: '2027-03-01T11:15:00.000Z', nextWindowClosesAt: null, denibbedAt: '2027-03-01T11:00:00.000Z' });
    expect(await ready(doorB)).toMatchObject({ abradeRequired: true, nextStep: 'Denib P320', nextStepKind: 'denib', nextStepGrit: 'P320' });
  });

  it('re-opens a missed recoat window: the next coat carries no "window missed" stop', async () => {
    // Door B goes on without a denib record: the planned denib is taken as done, as before denibs were recorded.
    await coat([doorA, doorB], topcoatId, '2027-03-01T11:20:00Z', 2).expect(201);
    // Four days on, the topcoat's window (about 56 h at 20 °C, between its 15 °C and 23 °C rows) has closed.
    at('2027-03-05T11:00:00Z');
    expect(await ready(doorA)).toMatchObject({ abradeRequired: true, nextStep: 'Denib P320', nextStepKind: 'denib', nextStepGrit: 'P320', nextWindowOpensAt: null });
    await post(lead, '/api/denibs', { spraySessionId: sessionId, partIds: [doorA], grit: 'P400', abradedAt: '2027-03-05T10:50:00Z' }).expect(201);
    expect(await ready(doorA)).toMatchObject({ abradeRequired: false, nextStep: 'Coat 3 of 3 at 40 µm dry', nextStepKind: 'coat', nextStepDryFilmUm: 40, nextWindowClosesAt: null });
    const last = await coat([doorA], topcoatId, '2027-03-05T11:00:00Z', 3).expect(201);
    expect(last.body.coat.warnings.map((w: { code: string }) => w.code)).not.toContain('recoat-window-missed');
    // Door B had no scuff after its window closed: the same coat on it is a stop.
    const missed = await coat([doorB], topcoatId, '2027-03-05T11:00:00Z', 3).expect(201);
    expect(missed.body.coat.warnings.map((w: { code: string }) => w.code)).toContain('recoat-window-missed');
  });

  it('lets a sprayer record only on sessions assigned to them; an assembler not at all', async () => {
    const body = { spraySessionId: othersSessionId, partIds: [doorB], grit: 'P320', abradedAt: '2027-03-05T10:00:00Z' };
    const refused = await post(sprayer, '/api/denibs', body).expect(403);
    expect(refused.body.error.fields).toHaveProperty('spraySessionId');
    await post(assembler, '/api/denibs', { ...body, spraySessionId: sessionId }).expect(403);
    await post(lead, '/api/denibs', body).expect(201);
  });

  it('answers 400 with field messages for a bad grit, no parts, a time ahead or long past, and 409 on a cancelled session', async () => {
    const bad = await post(sprayer, '/api/denibs', { spraySessionId: sessionId, partIds: [], grit: '320', abradedAt: 'yesterday' }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['abradedAt', 'grit', 'partIds']);
    const ahead = await post(sprayer, '/api/denibs', { spraySessionId: sessionId, partIds: [doorA], grit: 'P320', abradedAt: '2027-03-05T13:00:00Z' }).expect(400);
    expect(ahead.body.error.fields).toHaveProperty('abradedAt');
    // The clock stands at 5 March 2027: 1 December 2026 is more than 90 days back, a typing slip.
    const longAgo = await post(sprayer, '/api/denibs', { spraySessionId: sessionId, partIds: [doorA], grit: 'P320', abradedAt: '2026-12-01T10:00:00Z' }).expect(400);
    expect(longAgo.body.error.fields.abradedAt).toMatch(/within the last 90 days/);
    const unknown = await post(sprayer, '/api/denibs', { spraySessionId: sessionId, partIds: [999999], grit: 'P320', abradedAt: '2027-03-05T10:00:00Z' }).expect(400);
    expect(unknown.body.error.fields).toHaveProperty('partIds');
    const spare = await post(lead, '/api/spray-sessions', { boothId: 1, start: '2027-03-03T09:00:00Z', end: '2027-03-03T10:00:00Z', sprayerId: 3 }).expect(201);
    await lead.agent.patch(`/api/spray-sessions/${spare.body.spraySession.id}`).set('x-csrf-token', lead.csrf).send({ state: 'cancelled' }).expect(200);
    await post(sprayer, '/api/denibs', { spraySessionId: spare.body.spraySession.id, partIds: [doorA], grit: 'P320', abradedAt: '2027-03-05T10:00:00Z' }).expect(409);
  });
});

describe('GET /api/denibs', () => {
  it('lists a part’s and a session’s denibs, newest first, to those who read coats', async () => {
    const byPart = (await sprayer.agent.get(`/api/denibs?partId=${doorA}`).expect(200)).body;
    expect(byPart.items.map((d: { grit: string }) => d.grit)).toEqual(['P400', 'P320']);
    expect(byPart.total).toBe(2);
    const bySession = (await lead.agent.get(`/api/denibs?spraySessionId=${othersSessionId}`).expect(200)).body;
    expect(bySession.items).toHaveLength(1);
    expect(bySession.items[0].partIds).toEqual([doorB]);
    await assembler.agent.get(`/api/denibs?partId=${doorA}`).expect(403);
    const bad = await lead.agent.get('/api/denibs?partId=abc').expect(400);
    expect(bad.body.error.fields).toHaveProperty('partId');
  });
});

describe('denib records are append-only', () => {
  it('refuses any change or deletion in the database itself', async () => {
    await expect(ctx.dataSource.query("UPDATE denibs SET grit = 'P120'")).rejects.toThrow(/append_only/);
    await expect(ctx.dataSource.query('DELETE FROM denibs')).rejects.toThrow(/append_only/);
    await expect(ctx.dataSource.query('DELETE FROM denib_parts')).rejects.toThrow(/append_only/);
  });
});

describe('a denib in the part’s history and on the live feed', () => {
  it('shows in the part’s history, readable by the assembler, in order with the coats', async () => {
    const history = (await assembler.agent.get(`/api/parts/${doorA}/history`).expect(200)).body.history;
    expect(history.entries.map((e: { kind: string }) => e.kind)).toEqual(['coat', 'denib', 'coat', 'denib', 'coat']);
    expect(history.entries[1]).toMatchObject({ kind: 'denib', grit: 'P320', recordedByName: 'Mina Castell' });
    expect(history.readiness).toMatchObject({ coatsDone: 3, coatsTotal: 3, coatsRemaining: 0 });
    expect(history.steps.map((s: { kind: string }) => s.kind)).toEqual(['coat', 'abrade', 'coat', 'coat']);
    await assembler.agent.get('/api/parts/999999/history').expect(404);
  });

  it('is published to open boards as it is recorded', async () => {
    const cookie = (await lead.agent.get('/api/auth/me')).request.cookies;
    const server = ctx.app.listen(0);
    const controller = new AbortController();
    try {
      const response = await fetch(`http://127.0.0.1:${(server.address() as AddressInfo).port}/api/events`, { headers: { cookie }, signal: controller.signal });
      const reader = response.body!.getReader();
      await post(lead, '/api/denibs', { spraySessionId: sessionId, partIds: [doorB], grit: 'P320', abradedAt: '2027-03-05T10:55:00Z' }).expect(201);
      let text = '';
      while (!text.includes('denib.created')) text += new TextDecoder().decode((await reader.read()).value);
      expect(text).toContain(`"partIds":[${doorB}]`);
    } finally {
      controller.abort();
      server.close();
    }
  });
});
