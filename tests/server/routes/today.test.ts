import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

// Monday 4 January 2027, 10:00 in London (GMT in winter): "today" is the 4th, "tomorrow" the 5th.
const clock = { now: () => new Date('2027-01-04T10:00:00Z') };
let ctx: TestContext;
let lead: SignedIn;
let sprayer: SignedIn;
let booth: number;
let sessionToday: number;
let sessionTomorrow: number;
let twoCoatParts: number[];

const post = (who: SignedIn, path: string, body: object) => who.agent.post(path).set('x-csrf-token', who.csrf).send(body);
const patch = (who: SignedIn, path: string, body: object) => who.agent.patch(path).set('x-csrf-token', who.csrf).send(body);
const board = async (who: SignedIn) => (await who.agent.get('/api/today').expect(200)).body.today;

async function jobWithParts(reference: string, dueDate: string, finishSystemId: number): Promise<number[]> {
  const job = await post(lead, '/api/jobs', { customer: 'Day board test', reference, dueDate, finishSystemId }).expect(201);
  const parts = [];
  for (const label of ['Door A', 'Door B']) parts.push((await post(lead, `/api/jobs/${job.body.job.id}/parts`, { label, lengthMm: 700, widthMm: 400, thicknessMm: 18 }).expect(201)).body.part.id);
  return parts;
}

beforeAll(async () => {
  ctx = await startTestApp({ clock });
  lead = await signIn(ctx.app, demo.lead);
  sprayer = await signIn(ctx.app, demo.sprayer);
  // A booth of our own with no opening hours, so any hour can be booked.
  booth = (await post(lead, '/api/booths', { name: 'Day board booth', kind: 'down-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201)).body.booth.id;
  const precat = (await lead.agent.get('/api/products?q=Precat')).body.items[0].id;
  const twoCoats = (await post(lead, '/api/finish-systems', { name: 'Two precat coats', steps: [{ kind: 'coat', productId: precat, dryFilmUm: 30 }, { kind: 'coat', productId: precat, dryFilmUm: 30 }] }).expect(201)).body.finishSystem.id;
  const painted = (await lead.agent.get('/api/finish-systems')).body.items.find((s: { name: string }) => s.name === 'Painted MDF, 2K PU satin').id;
  twoCoatParts = await jobWithParts('TD-1', '2027-01-20', twoCoats);
  await jobWithParts('TD-2', '2027-01-04', painted);
  const primedParts = await jobWithParts('TD-3', '2027-02-01', painted);

  // Yesterday's session: a precat coat on TD-1 (its recoat window, 1440 min at 20 °C, closes today at 12:00)
  // and a 2K primer on TD-3 (a P320 denib is the next step of that system).
  const yesterday = (await post(lead, '/api/spray-sessions', { boothId: booth, start: '2027-01-03T11:00:00Z', end: '2027-01-03T13:00:00Z' }).expect(201)).body.spraySession.id;
  const coat = (partIds: number[], productId: number) => post(lead, '/api/coats', { spraySessionId: yesterday, partIds, productId, sprayedAt: '2027-01-03T12:00:00Z', airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 }).expect(201);
  await coat(twoCoatParts, precat);
  await coat(primedParts, (await lead.agent.get('/api/products?q=PU Primer')).body.items[0].id);

  const today = await post(lead, '/api/spray-sessions', { boothId: booth, start: '2027-01-04T11:00:00Z', end: '2027-01-04T11:30:00Z', sprayerId: 3, items: twoCoatParts.map((partId) => ({ partId, stepPosition: 1 })) }).expect(201);
  sessionToday = today.body.spraySession.id;
  sessionTomorrow = (await post(lead, '/api/spray-sessions', { boothId: booth, start: '2027-01-05T09:00:00Z', end: '2027-01-05T10:00:00Z' }).expect(201)).body.spraySession.id;
  await post(lead, '/api/booths/1/sensor-token', {}).expect(201);
});
afterAll(async () => ctx?.close());

describe('GET /api/today for a lead', () => {
  it('lists today’s and tomorrow’s sessions with their sprayer, what they spray and the next step', async () => {
    const day = await board(lead);
    expect(day).toMatchObject({ view: 'lead', today: '2027-01-04', tomorrow: '2027-01-05' });
    expect(day.sessions.map((s: { id: number; date: string }) => [s.id, s.date])).toEqual([
      [sessionToday, '2027-01-04'],
      [sessionTomorrow, '2027-01-05'],
    ]);
    const [first, second] = day.sessions;
    expect(first).toMatchObject({ sprayerName: 'Mina Castell', state: 'planned', nextStep: { kind: 'checklist', words: 'Run the pre-spray checklist' } });
    expect(first.work.coats[0]).toMatchObject({ jobReference: 'TD-1', coatNumber: 2, coatsTotal: 2, productName: 'Kestrel Precat Clear Matt', partCount: 2 });
    expect(second.sprayerId).toBeNull();
    expect(day.sprayers.map((s: { name: string }) => s.name)).toEqual(['Dev Okafor', 'Mina Castell']);
    expect(day.booths.map((b: { name: string }) => b.name)).toContain('Day board booth');
  });

  it('shows recoat windows closing today with the session that meets them, and parts waiting on a denib', async () => {
    const day = await board(lead);
    expect(day.recoatClosing).toEqual([
      { jobId: expect.any(Number), jobReference: 'TD-1', customer: 'Day board test', partCount: 2, closesAt: '2027-01-04T12:00:00.000Z', nextStep: 'Coat 2 of 2', bookedSessionId: sessionToday, bookedStart: '2027-01-04T11:00:00.000Z' },
    ]);
    expect(day.denibWaiting).toContainEqual({ jobId: expect.any(Number), jobReference: 'TD-3', customer: 'Day board test', partCount: 2, grit: 'P320', missedWindowCount: 0 });
  });

  it('names the jobs at risk of missing their due date, and why', async () => {
    const painted = (await lead.agent.get('/api/finish-systems')).body.items.find((s: { name: string }) => s.name === 'Painted MDF, 2K PU satin').id;
    await jobWithParts('TD-4', '2027-01-01', painted);
    // Past its due date but every part collected: delivered, so not at risk.
    for (const partId of await jobWithParts('TD-5', '2027-01-01', painted)) await post(lead, `/api/parts/${partId}/collect`, {}).expect(200);
    const risks = (await board(lead)).jobsAtRisk;
    expect(risks.find((r: { jobReference: string }) => r.jobReference === 'TD-4')).toMatchObject({ reason: 'overdue', words: 'Overdue: it was due 2027-01-01' });
    expect(risks.map((r: { jobReference: string }) => r.jobReference)).not.toContain('TD-5');
    // TD-2 is due today with three coats and their drying still ahead; TD-1 and TD-3 have time.
    expect(risks.find((r: { jobReference: string }) => r.jobReference === 'TD-2')).toMatchObject({ reason: 'finishes-late', dueDate: '2027-01-04' });
    expect(risks.map((r: { jobReference: string }) => r.jobReference)).not.toContain('TD-1');
    expect(risks.map((r: { jobReference: string }) => r.jobReference)).not.toContain('TD-3');
  });

  it('lists a booth sensor that has not posted, until it does', async () => {
    expect((await board(lead)).staleSensors).toEqual([{ boothId: 1, boothName: 'Booth 1 (cross-draft)', lastReadingAt: null }]);
    const token = (await post(lead, '/api/booths/1/sensor-token', {}).expect(201)).body.token;
    await request(ctx.app).post('/api/readings').set('authorization', `Bearer ${token}`).send({ boothId: 1, airTempC: 19, relativeHumidityPct: 55 }).expect(201);
    expect((await board(lead)).staleSensors).toEqual([]);
  });
  it('lists the booths and people whose upkeep or crew records are due, as the upkeep page does', async () => {
    const due = (await board(lead)).upkeepDue;
    expect(due).toEqual((await lead.agent.get('/api/upkeep/due').expect(200)).body.due);
    // The test's own booth has no extraction test or fire inspection on record: it is not fit to spray.
    const ours = due.booths.find((b: { boothId: number }) => b.boothId === booth);
    expect(ours.fit).toBe(false);
    expect(ours.items.map((i: { kind: string; status: string }) => `${i.kind}:${i.status}`)).toEqual(expect.arrayContaining(['extraction-test:none', 'fire-inspection:none']));
  });
});

describe('GET /api/today for a sprayer', () => {
  it('lists my sessions today, my next one and how many sessions nobody has been given', async () => {
    const day = await board(sprayer);
    expect(day).toMatchObject({ view: 'sprayer', today: '2027-01-04', nextSession: null });
    expect(day.mySessions.map((s: { id: number }) => s.id)).toEqual([sessionToday]);
    expect(day.unassignedToday).toBe(0);
    await patch(lead, `/api/spray-sessions/${sessionTomorrow}`, { sprayerId: 3 }).expect(200);
    expect((await board(sprayer)).nextSession).toMatchObject({ id: sessionTomorrow, date: '2027-01-05' });
  });

  it('follows the session through checklist, mix, coat, stop and clearance', async () => {
    const next = async () => (await board(sprayer)).mySessions[0].nextStep;
    const checklist = { extractionRunning: true, filtersChecked: true, faceVelocityMps: 0.55, respiratorFitted: true, respiratorKind: 'air-fed', airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 };
    await patch(sprayer, `/api/spray-sessions/${sessionToday}`, { checklist, state: 'checking' }).expect(200);
    expect(await next()).toMatchObject({ kind: 'start-spraying' });
    await patch(sprayer, `/api/spray-sessions/${sessionToday}`, { state: 'spraying' }).expect(200);
    // The precat is a two-pack (10 : 1 with its catalyst): a pot comes first.
    expect(await next()).toMatchObject({ kind: 'mix', words: 'Mix Kestrel Precat Clear Matt (no pot in its pot life yet)' });
    const precat = (await lead.agent.get('/api/products?q=Precat')).body.items[0].id;
    await post(sprayer, `/api/spray-sessions/${sessionToday}/mixes`, { productId: precat, wantedL: 1, tempC: 20, mixedAt: '2027-01-04T09:55:00Z' }).expect(201);
    expect(await next()).toMatchObject({ kind: 'coat', words: 'Coat 2 of 2: Kestrel Precat Clear Matt on 2 parts' });
    await post(sprayer, '/api/coats', { spraySessionId: sessionToday, partIds: twoCoatParts, productId: precat, sprayedAt: '2027-01-04T10:00:00Z', airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 }).expect(201);
    expect(await next()).toMatchObject({ kind: 'stop-spraying' });
    await patch(sprayer, `/api/spray-sessions/${sessionToday}`, { state: 'clearing' }).expect(200);
    const clearing = await next();
    // The booth: 60 m³ at 18 000 m³/h, K = 3 (default): 3 × 60 / 18 000 h × ln 100 = 2.76 min after 10:00.
    expect(clearing.kind).toBe('clearance');
    expect(Date.parse(clearing.at) - Date.parse('2027-01-04T10:00:00Z')).toBeCloseTo(3 * (60 / 18000) * 60 * Math.log(100) * 60_000, -2);
  });
});

describe('GET /api/today for an assembler', () => {
  it('answers 403: their day is the ready board', async () => {
    const assembler = await signIn(ctx.app, demo.assembler);
    await assembler.agent.get('/api/today').expect(403);
  });
});
