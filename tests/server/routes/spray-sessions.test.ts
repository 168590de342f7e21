import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let lead: SignedIn;
let boothId: number;
beforeAll(async () => {
  ctx = await startTestApp();
  lead = await signIn(ctx.app, demo.lead);
  // A booth of our own, with no opening hours set: bookable at any hour.
  const booth = await lead.agent.post('/api/booths').set('x-csrf-token', lead.csrf).send({ name: 'Session test booth', kind: 'down-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201);
  boothId = booth.body.booth.id;
});
afterAll(async () => ctx.close());

const book = (who: SignedIn, body: object) => who.agent.post('/api/spray-sessions').set('x-csrf-token', who.csrf).send(body);

describe('POST /api/spray-sessions', () => {
  it('books a slot and answers 409 naming the booth and the session’s time in shop time when another overlaps it', async () => {
    const first = await book(lead, { boothId, start: '2027-03-01T09:00:00Z', end: '2027-03-01T10:00:00Z' }).expect(201);
    expect(first.body.spraySession).toMatchObject({ boothId, state: 'planned', start: '2027-03-01T09:00:00.000Z', sprayerId: null });
    const clash = await book(lead, { boothId, start: '2027-03-01T09:30:00+00:00', end: '2027-03-01T11:00:00+00:00' }).expect(409);
    expect(clash.body.error.code).toBe('conflict');
    // Europe/London in March is GMT, the shop's locale en-GB: the clash reads "Mon 1 Mar, 09:00–10:00", no id, no zone.
    expect(clash.body.error.message).toMatch(/ is already booked Mon 1 Mar, 09:00–10:00$/);
    expect(clash.body.error.message).not.toMatch(/spray session|GMT|\d{4}-\d\d/);
    // Touching ends do not overlap.
    await book(lead, { boothId, start: '2027-03-01T10:00:00Z', end: '2027-03-01T10:30:00Z' }).expect(201);
  });

  it('lets exactly one of several racing bookings of one slot win', async () => {
    const tries = await Promise.all(Array.from({ length: 6 }, () => book(lead, { boothId, start: '2027-03-02T13:00:00Z', end: '2027-03-02T14:00:00Z' })));
    const statuses = tries.map((r) => r.status).sort();
    expect(statuses).toEqual([201, 409, 409, 409, 409, 409]);
  });

  it('refuses a booking outside the booth’s opening hours unless a lead gives a reason', async () => {
    // Demo booth 1 opens Monday to Friday, 07:00–17:00 in Europe/London; 2027-03-06 is a Saturday.
    const saturday = { boothId: 1, start: '2027-03-06T09:00:00Z', end: '2027-03-06T10:00:00Z' };
    const refused = await book(lead, saturday).expect(409);
    expect(refused.body.error).toMatchObject({ code: 'outside_opening_hours' });
    expect(refused.body.error.message).toMatch(/closed on Saturdays/);
    const overridden = await book(lead, { ...saturday, override: { reason: 'Rush job for Ardent, agreed with the owner' } }).expect(201);
    expect(overridden.body.spraySession.overrideReason).toMatch(/Rush job/);
  });

  it('reads opening hours on the shop’s wall clock across the clock change', async () => {
    // 2027-03-29 is a Monday after the spring change: 06:30Z is 07:30 BST, inside 07:00–17:00.
    await book(lead, { boothId: 2, start: '2027-03-29T06:30:00Z', end: '2027-03-29T07:30:00Z' }).expect(201);
    // A week earlier (GMT) the same UTC time is 06:30 on the wall: before opening.
    await book(lead, { boothId: 2, start: '2027-03-22T06:30:00Z', end: '2027-03-22T07:30:00Z' }).expect(409);
  });

  it('refuses to book one sprayer in two booths at once, naming the other booking by booth, start and job', async () => {
    const job = (await lead.agent.get('/api/jobs?q=LJ-26-105')).body.items[0];
    const partId = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items[1].id;
    await book(lead, { boothId, start: '2027-03-03T09:00:00Z', end: '2027-03-03T10:00:00Z', sprayerId: 3, items: [{ partId, stepPosition: null }] }).expect(201);
    const res = await book(lead, { boothId: 1, start: '2027-03-03T09:30:00Z', end: '2027-03-03T10:30:00Z', sprayerId: 3 }).expect(409);
    expect(res.body.error.fields).toHaveProperty('sprayerId');
    expect(res.body.error.message).toMatch(/^Mina Castell is already booked then: .+ from Wed 3 Mar, 09:00 for LJ-26-105$/);
  });

  it('answers 400 for an end before the start and for times without an offset', async () => {
    const backwards = await book(lead, { boothId, start: '2027-03-04T10:00:00Z', end: '2027-03-04T09:00:00Z' }).expect(400);
    expect(backwards.body.error.fields).toHaveProperty('end');
    const naive = await book(lead, { boothId, start: '2027-03-04T10:00:00', end: '2027-03-04T11:00:00' }).expect(400);
    expect(naive.body.error.fields).toHaveProperty('start');
  });

  it('lets a sprayer read but not book, and move only their own session through its steps', async () => {
    const sprayer = await signIn(ctx.app, demo.sprayer);
    await sprayer.agent.get('/api/spray-sessions?from=2027-03-01T00:00:00Z&to=2027-03-08T00:00:00Z').expect(200);
    await book(sprayer, { boothId, start: '2027-03-05T09:00:00Z', end: '2027-03-05T10:00:00Z' }).expect(403);
    const mine = await book(lead, { boothId, start: '2027-03-05T09:00:00Z', end: '2027-03-05T10:00:00Z', sprayerId: 3 }).expect(201);
    const id = mine.body.spraySession.id;
    await sprayer.agent.patch(`/api/spray-sessions/${id}`).set('x-csrf-token', sprayer.csrf).send({ state: 'checking' }).expect(200);
    await sprayer.agent.patch(`/api/spray-sessions/${id}`).set('x-csrf-token', sprayer.csrf).send({ start: '2027-03-05T08:00:00Z' }).expect(403);
  });
});

describe('cautions and sprayers', () => {
  it('works out a session’s cautions on the server, for any role, ending with the SDS line', async () => {
    const job = (await lead.agent.get('/api/jobs?q=LJ-26-105')).body.items[0];
    const partId = (await lead.agent.get(`/api/jobs/${job.id}/parts`)).body.items[0].id;
    const session = await book(lead, { boothId, start: '2027-03-08T09:00:00Z', end: '2027-03-08T10:00:00Z', items: [{ partId, stepPosition: null }] }).expect(201);
    const assembler = await signIn(ctx.app, demo.assembler);
    const res = await assembler.agent.get(`/api/spray-sessions/${session.body.spraySession.id}/cautions`).expect(200);
    expect(res.body.products.map((p: { name: string }) => p.name)).toEqual(['Kestrel 2K PU Primer White']);
    expect(res.body.cautions[0].code).toBe('respirator-air-fed');
    expect(res.body.cautions.at(-1).code).toBe('defer');
  });

  it('lists who can be given a session without exposing the user admin list', async () => {
    const res = await lead.agent.get('/api/sprayers').expect(200);
    expect(res.body.items).toEqual(expect.arrayContaining([{ id: 3, name: 'Mina Castell', role: 'sprayer', siteId: 1 }]));
    expect(res.body.items.every((u: { role: string }) => ['sprayer', 'lead'].includes(u.role))).toBe(true);
  });
});

describe('GET and PATCH /api/spray-sessions', () => {
  it('lists a week for one booth and moves a session only into free time', async () => {
    const a = await book(lead, { boothId, start: '2027-04-05T09:00:00Z', end: '2027-04-05T10:00:00Z' }).expect(201);
    await book(lead, { boothId, start: '2027-04-05T11:00:00Z', end: '2027-04-05T12:00:00Z' }).expect(201);
    const week = await lead.agent.get(`/api/spray-sessions?from=2027-04-05T00:00:00Z&to=2027-04-12T00:00:00Z&boothId=${boothId}`).expect(200);
    expect(week.body.total).toBe(2);
    const id = a.body.spraySession.id;
    await lead.agent.patch(`/api/spray-sessions/${id}`).set('x-csrf-token', lead.csrf).send({ end: '2027-04-05T11:30:00Z' }).expect(409);
    const moved = await lead.agent.patch(`/api/spray-sessions/${id}`).set('x-csrf-token', lead.csrf).send({ start: '2027-04-05T13:00:00Z', end: '2027-04-05T14:00:00Z' }).expect(200);
    expect(moved.body.spraySession.start).toBe('2027-04-05T13:00:00.000Z');
    // A cancelled session frees its slot.
    await lead.agent.patch(`/api/spray-sessions/${id}`).set('x-csrf-token', lead.csrf).send({ state: 'cancelled' }).expect(200);
    await book(lead, { boothId, start: '2027-04-05T13:00:00Z', end: '2027-04-05T14:00:00Z' }).expect(201);
  });

  it('keeps the database from holding two live sessions of one booth even when the service is bypassed', async () => {
    await book(lead, { boothId, start: '2027-05-03T09:00:00Z', end: '2027-05-03T10:00:00Z' }).expect(201);
    const insert = ctx.dataSource.query(
      `INSERT INTO spray_sessions (booth_id, start_at, end_at, state, notes, created_at, updated_at) VALUES (${boothId}, '2027-05-03T09:30:00.000Z', '2027-05-03T10:30:00.000Z', 'planned', '', 'x', 'x')`,
    );
    await expect(insert).rejects.toThrow(/booth_overlap/);
  });
});

describe('rack space', () => {
  it('refuses to book more parts than the racks can hold unless a lead gives a reason', async () => {
    // Demo racks hold 20 × 1.2 + 20 × 1.2 + 10 × 0.8 = 56 m² of shelf; one job of huge panels needs more.
    const job = await lead.agent.post('/api/jobs').set('x-csrf-token', lead.csrf).send({ customer: 'Big Co', reference: 'RACK-1', dueDate: '2027-06-01' }).expect(201);
    const part = await lead.agent.post(`/api/jobs/${job.body.job.id}/parts`).set('x-csrf-token', lead.csrf).send({ label: 'Huge panel', lengthMm: 2400, widthMm: 1200, thicknessMm: 18, quantity: 20 }).expect(201);
    const body = { boothId, start: '2027-05-03T12:00:00Z', end: '2027-05-03T13:00:00Z', items: [{ partId: part.body.part.id, stepPosition: null }] };
    const refused = await book(lead, body).expect(409);
    // 20 × 2.4 m × 1.2 m = 57.6 m² lying flat.
    expect(refused.body.error).toMatchObject({ code: 'rack_space' });
    expect(refused.body.error.message).toContain('57.6 m²');
    await book(lead, { ...body, override: { reason: 'Panels go on edge in the store' } }).expect(201);
  });
});
