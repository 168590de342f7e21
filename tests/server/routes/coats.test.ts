import psychrolib from 'psychrolib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dewPointC } from '../../../shared/finishing/conditions';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
let sprayer: SignedIn;
let sessionId: number;
let partIds: number[];
let primerId: number;

beforeAll(async () => {
  psychrolib.SetUnitSystem(psychrolib.SI);
  // The shop's clock stands just after the morning's coats: what people type lies near now.
  ctx = await startTestApp({ clock: { now: () => new Date('2027-03-01T12:30:00Z') } });
  lead = await signIn(ctx.app, demo.lead);
  sprayer = await signIn(ctx.app, demo.sprayer);
  const booth = await lead.agent.post('/api/booths').set('x-csrf-token', lead.csrf).send({ name: 'Coat test booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201);
  const session = await lead.agent
    .post('/api/spray-sessions')
    .set('x-csrf-token', lead.csrf)
    .send({ boothId: booth.body.booth.id, start: '2027-03-01T09:00:00Z', end: '2027-03-01T12:00:00Z', sprayerId: 3 })
    .expect(201);
  sessionId = session.body.spraySession.id;
  const job = (await lead.agent.get('/api/jobs?q=LJ-26-105')).body.items[0];
  partIds = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items.slice(0, 2).map((p: { id: number }) => p.id);
  primerId = (await lead.agent.get('/api/products?q=PU Primer')).body.items[0].id;
});
afterAll(async () => ctx.close());

const coat = (overrides: object = {}) => ({
  spraySessionId: sessionId,
  partIds,
  productId: primerId,
  sprayedAt: '2027-03-01T09:15:00Z',
  airTempC: 20,
  relativeHumidityPct: 50,
  surfaceTempC: 19,
  thinningPct: 15,
  wetFilmUm: 150,
  ...overrides,
});

describe('POST /api/coats', () => {
  it('records a coat with every computed time and its dry film', async () => {
    const res = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(coat()).expect(201);
    const c = res.body.coat;
    // Dew point: PsychroLib (ASHRAE Handbook Fundamentals 2017 ch. 1) at 20 °C / 50 % RH; Magnus agrees within 0.05 °C.
    expect(c.dewPointC).toBeCloseTo(psychrolib.GetTDewPointFromRelHum(20, 0.5), 1);
    // DFT = WFT × VS / (100 + thinning %) (coatings makers' handy calculations): 150 × 45 / 115 = 58.7 µm.
    expect(c.dryFilmUm).toBeCloseTo(58.7, 1);
    // The demo primer's data sheet row at 20 °C: flash-off 10, recoat 120–1440 min, handle 180, pack 480, cure 168 h.
    expect(c).toMatchObject({
      stepPosition: 0,
      dryingTempC: 20,
      dryingMethod: 'exact-row',
      flashOffEndsAt: '2027-03-01T09:25:00.000Z',
      recoatOpensAt: '2027-03-01T11:15:00.000Z',
      recoatClosesAt: '2027-03-02T09:15:00.000Z',
      handleAt: '2027-03-01T12:15:00.000Z',
      packAt: '2027-03-01T17:15:00.000Z',
      fullCureAt: '2027-03-08T09:15:00.000Z',
      partIds: [...partIds].sort((a, b) => a - b),
      recordedByName: 'Mina Castell',
      version: 1,
    });
    expect(c.warnings).toEqual([]);
  });

  it('records a coat made in poor conditions with its warnings and the reason given', async () => {
    const res = await sprayer.agent
      .post('/api/coats')
      .set('x-csrf-token', sprayer.csrf)
      .send(coat({ partIds: [partIds[0]], sprayedAt: '2027-03-01T11:30:00Z', relativeHumidityPct: 85, surfaceTempC: 18, acknowledgements: [{ code: 'relative-humidity', reason: 'Dehumidifier running, lead agreed' }] }))
      .expect(201);
    const codes = res.body.coat.warnings.map((w: { code: string }) => w.code);
    expect(codes).toEqual(expect.arrayContaining(['relative-humidity', 'dew-point-margin']));
    const humidity = res.body.coat.warnings.find((w: { code: string }) => w.code === 'relative-humidity');
    expect(humidity.acknowledgedReason).toBe('Dehumidifier running, lead agreed');
  });

  it('records a coat 3.1 °C above the dew point with no warning: the limit is 3 °C', async () => {
    // Design limit: surface at least 3 °C above the dew point (ISO 8502-4 practice; trade-reference §1.2).
    // Dew point at 20 °C / 50 % RH from the shared Magnus formula, checked against PsychroLib in conditions.test.ts.
    const surfaceTempC = Math.round((dewPointC(20, 50) + 3.1) * 100) / 100;
    // Two first coats on parts of another job, so no recoat window or film target comes into it.
    const job = (await lead.agent.get('/api/jobs?q=LJ-26-101')).body.items[0];
    const [first, second] = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items.map((p: { id: number }) => p.id);
    const sent = (partId: number, surface: number) => coat({ partIds: [partId], sprayedAt: '2027-03-01T11:35:00Z', surfaceTempC: surface, wetFilmUm: null });
    const res = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(sent(first, surfaceTempC)).expect(201);
    expect(res.body.coat.warnings).toEqual([]);
    const below = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(sent(second, surfaceTempC - 0.2)).expect(201);
    expect(below.body.coat.warnings.map((w: { code: string }) => w.code)).toEqual(['dew-point-margin']);
  });

  it('returns the first record, not a second, when a device resends with the same idempotency key', async () => {
    const body = coat({ partIds: [partIds[1]], sprayedAt: '2027-03-01T11:40:00Z', idempotencyKey: 'tablet-1-coat-0001' });
    const first = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(body).expect(201);
    const again = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(body).expect(200);
    expect(again.body.coat.id).toBe(first.body.coat.id);
    expect(again.body.replayed).toBe(true);
  });

  it('answers 400 naming the fields for impossible readings and unknown parts', async () => {
    const res = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(coat({ relativeHumidityPct: 120, wetFilmUm: -5 })).expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['relativeHumidityPct', 'wetFilmUm']);
    const unknown = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(coat({ partIds: [999999] })).expect(400);
    expect(unknown.body.error.fields).toHaveProperty('partIds');
  });

  it('answers 403 to an assembler', async () => {
    const assembler = await signIn(ctx.app, demo.assembler);
    await assembler.agent.post('/api/coats').set('x-csrf-token', assembler.csrf).send(coat()).expect(403);
  });
});

describe('corrections and the append-only record', () => {
  it('makes a new version that points at the old one and keeps both', async () => {
    const original = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(coat({ partIds: [partIds[0]], sprayedAt: '2027-03-01T11:50:00Z' })).expect(201);
    const id = original.body.coat.id;
    const fixed = await sprayer.agent.post(`/api/coats/${id}/corrections`).set('x-csrf-token', sprayer.csrf).send({ reason: 'Wrong comb reading typed', wetFilmUm: 130 }).expect(201);
    expect(fixed.body.coat).toMatchObject({ replacesId: id, version: 2, correctionReason: 'Wrong comb reading typed', wetFilmUm: 130 });
    const old = await sprayer.agent.get(`/api/coats/${id}`).expect(200);
    expect(old.body.coat).toMatchObject({ wetFilmUm: 150, supersededById: fixed.body.coat.id });
    const current = await sprayer.agent.get(`/api/coats?spraySessionId=${sessionId}&pageSize=100`).expect(200);
    const ids = current.body.items.map((c: { id: number }) => c.id);
    expect(ids).toContain(fixed.body.coat.id);
    expect(ids).not.toContain(id);
    const history = await sprayer.agent.get(`/api/coats?spraySessionId=${sessionId}&history=true&pageSize=100`).expect(200);
    expect(history.body.items.map((c: { id: number }) => c.id)).toContain(id);
    await sprayer.agent.post(`/api/coats/${id}/corrections`).set('x-csrf-token', sprayer.csrf).send({ reason: 'Again' }).expect(409);
  });

  it('pages the current coats newest first with the same total on every page, the history counted apart', async () => {
    const url = (query: string) => `/api/coats?spraySessionId=${sessionId}&${query}`;
    const whole = (await sprayer.agent.get(url('pageSize=200')).expect(200)).body;
    expect(whole.total).toBe(whole.items.length);
    expect(whole.total).toBeGreaterThanOrEqual(3);
    const pages = [1, 2, 3].map((page) => sprayer.agent.get(url(`pageSize=${whole.total - 1}&page=${page}`)).expect(200));
    const [first, second, past] = (await Promise.all(pages)).map((res) => res.body);
    expect([first.total, second.total, past.total]).toEqual([whole.total, whole.total, whole.total]);
    expect([...first.items, ...second.items].map((c: { id: number }) => c.id)).toEqual(whole.items.map((c: { id: number }) => c.id));
    expect(past.items).toEqual([]);
    const history = (await sprayer.agent.get(url('history=true&pageSize=1')).expect(200)).body;
    expect(history.total).toBeGreaterThan(whole.total);
  });

  it('refuses, in the database itself, to change or delete a coat record', async () => {
    await expect(ctx.dataSource.query('UPDATE coats SET wet_film_um = 1')).rejects.toThrow(/append_only/);
    await expect(ctx.dataSource.query('DELETE FROM coat_parts')).rejects.toThrow(/append_only/);
    await expect(ctx.dataSource.query('DELETE FROM coats')).rejects.toThrow(/append_only/);
  });
});

describe('GET /api/ready', () => {
  it('shows each coated part’s state and when it can be handled', async () => {
    const job = (await lead.agent.get('/api/jobs?q=LJ-26-105')).body.items[0];
    const res = await lead.agent.get(`/api/ready?jobId=${job.id}`).expect(200);
    const coated = res.body.items.find((p: { id: number }) => p.id === partIds[1]);
    // This part had the primer, then (the idempotency test) a second coat taken as the next coat step.
    expect(coated).toMatchObject({ jobId: job.id, state: 'in-finish', coatsDone: 2, coatsTotal: 3 });
    expect(coated.handleAt).toMatch(/^2027-03-01T/);
    const untouched = res.body.items.find((p: { id: number }) => !partIds.includes(p.id));
    expect(untouched).toMatchObject({ state: 'waiting', handleAt: null, rack: null });
  });
});

describe('a correction that names one field', () => {
  it('keeps every other field of the coat as it was', async () => {
    const original = await sprayer.agent
      .post('/api/coats')
      .set('x-csrf-token', sprayer.csrf)
      .send(coat({ partIds: [partIds[0]], sprayedAt: '2027-03-01T11:55:00Z', thinningPct: 12, stepPosition: 2 }))
      .expect(201);
    const fixed = await sprayer.agent.post(`/api/coats/${original.body.coat.id}/corrections`).set('x-csrf-token', sprayer.csrf).send({ reason: 'Comb misread', wetFilmUm: 140 }).expect(201);
    expect(fixed.body.coat).toMatchObject({ wetFilmUm: 140, thinningPct: 12, stepPosition: 2 });
  });
});

describe('a coat resent while the first send is still being written', () => {
  it('keeps one record when a device resends the same coat twice at once', async () => {
    const body = coat({ partIds: [partIds[0]], sprayedAt: '2027-03-01T11:58:00Z', stepPosition: 2, idempotencyKey: 'tablet-1-coat-0002' });
    const send = () => sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(body);
    const [a, b] = await Promise.all([send(), send()]);
    expect([a.status, b.status].sort()).toEqual([200, 201]);
    expect(a.body.coat.id).toBe(b.body.coat.id);
  });
});

describe('a session not assigned to the sprayer', () => {
  it('takes no coats, pots or corrections from them, and still takes them from a lead', async () => {
    const booth = await lead.agent.post('/api/booths').set('x-csrf-token', lead.csrf).send({ name: 'Unassigned booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201);
    const other = await lead.agent
      .post('/api/spray-sessions')
      .set('x-csrf-token', lead.csrf)
      .send({ boothId: booth.body.booth.id, start: '2027-03-01T12:00:00Z', end: '2027-03-01T14:00:00Z', sprayerId: null })
      .expect(201);
    const otherId = other.body.spraySession.id;
    const refused = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(coat({ spraySessionId: otherId, sprayedAt: '2027-03-01T12:15:00Z' })).expect(403);
    expect(refused.body.error.fields.spraySessionId).toBe('Not your session');
    await sprayer.agent.post(`/api/spray-sessions/${otherId}/mixes`).set('x-csrf-token', sprayer.csrf).send({ productId: primerId, wantedL: 1, tempC: 20 }).expect(403);
    const byLead = await lead.agent.post('/api/coats').set('x-csrf-token', lead.csrf).send(coat({ spraySessionId: otherId, sprayedAt: '2027-03-01T12:15:00Z' })).expect(201);
    await sprayer.agent.post(`/api/coats/${byLead.body.coat.id}/corrections`).set('x-csrf-token', sprayer.csrf).send({ reason: 'Not mine to fix', notes: 'x' }).expect(403);
  });
});

describe('instants people type for what happened', () => {
  // The shop's clock stands at 2027-03-01T12:30Z in this file.
  it.each([
    ['the year 9999', '9999-03-01T09:15:00Z', /between the years 2000 and 2199/],
    ['the year 0000', '0000-03-01T09:15:00Z', /between the years 2000 and 2199/],
    ['more than 90 days ago', '2026-11-30T09:15:00Z', /within the last 90 days/],
    ['two hours ahead', '2027-03-01T14:30:00Z', /Cannot be in the future/],
  ])('refuses a coat sprayed %s, naming the field', async (_label, sprayedAt, message) => {
    const res = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(coat({ partIds: [partIds[0]], sprayedAt })).expect(400);
    expect(res.body.error.fields.sprayedAt).toMatch(message);
  });

  it('takes a coat a tablet sends a day late, and refuses a correction that moves it a year on', async () => {
    const late = await sprayer.agent.post('/api/coats').set('x-csrf-token', sprayer.csrf).send(coat({ partIds: [partIds[0]], sprayedAt: '2027-02-28T11:00:00Z', stepPosition: 0 })).expect(201);
    const res = await sprayer.agent.post(`/api/coats/${late.body.coat.id}/corrections`).set('x-csrf-token', sprayer.csrf).send({ reason: 'Typed the year wrong', sprayedAt: '2028-02-28T11:00:00Z' }).expect(400);
    expect(res.body.error.fields).toHaveProperty('sprayedAt');
  });

  it('refuses a reading or a pot dated far from now', async () => {
    const reading = await lead.agent.post('/api/readings').set('x-csrf-token', lead.csrf).send({ boothId: 1, at: '9999-01-01T00:00:00Z', airTempC: 20, relativeHumidityPct: 50 }).expect(400);
    expect(reading.body.error.fields).toHaveProperty('at');
    const late = await lead.agent.post('/api/readings').set('x-csrf-token', lead.csrf).send({ boothId: 1, at: '2026-10-01T00:00:00Z', airTempC: 20, relativeHumidityPct: 50 }).expect(400);
    expect(late.body.error.fields.at).toMatch(/within the last 90 days/);
    const mix = await lead.agent.post(`/api/spray-sessions/${sessionId}/mixes`).set('x-csrf-token', lead.csrf).send({ productId: primerId, wantedL: 1, thinningPct: 0, tempC: 20, mixedAt: '2027-03-02T09:00:00Z' }).expect(400);
    expect(mix.body.error.fields.mixedAt).toMatch(/Cannot be in the future/);
  });
});
