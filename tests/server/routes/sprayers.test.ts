import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

// Who a session can be given to: the active sprayers and leads of the booth's own site.
let ctx: TestContext;
let admin: SignedIn;
let lead: SignedIn;
let riverside: number;
let riversideBooth: number;
let riversideSprayer: number;
let assemblerId: number;
let disabledSprayer: number;

const post = (who: SignedIn, path: string, body: object) => who.agent.post(path).set('x-csrf-token', who.csrf).send(body);
const patch = (who: SignedIn, path: string, body: object) => who.agent.patch(path).set('x-csrf-token', who.csrf).send(body);
const names = (items: { name: string }[]) => items.map((u) => u.name);

beforeAll(async () => {
  ctx = await startTestApp();
  admin = await signIn(ctx.app, demo.admin);
  lead = await signIn(ctx.app, demo.lead);
  riverside = (await post(admin, '/api/sites', { name: 'Riverside works' }).expect(201)).body.site.id;
  riversideBooth = (await post(admin, '/api/booths', { name: 'Riverside booth', kind: 'spray-room', volumeM3: 60, extractionM3PerH: 12000, siteId: riverside }).expect(201)).body.booth.id;
  riversideSprayer = (await post(admin, '/api/users', { email: 'rio@larchmere.test', name: 'Rio Tanaka', role: 'sprayer', password: 'riverside-sprayer-1', siteId: riverside }).expect(201)).body.user.id;
  const gone = await post(admin, '/api/users', { email: 'gone@larchmere.test', name: 'Gone Sprayer', role: 'sprayer', password: 'gone-sprayer-2026' }).expect(201);
  disabledSprayer = gone.body.user.id;
  await patch(admin, `/api/users/${disabledSprayer}`, { disabled: true }).expect(200);
  assemblerId = (await signIn(ctx.app, demo.assembler).then((a) => a.agent.get('/api/auth/me'))).body.user.id;
});
afterAll(async () => ctx?.close());

describe('GET /api/sprayers', () => {
  it('gives a lead the active sprayers and leads of their own site only', async () => {
    const res = await lead.agent.get('/api/sprayers').expect(200);
    expect(names(res.body.items)).toEqual(['Dev Okafor', 'Mina Castell']);
    expect(res.body.items.every((u: { siteId: number }) => u.siteId === 1)).toBe(true);
  });

  it('follows the booth named by ?boothId, and treats another site’s booth as unknown to a lead', async () => {
    expect(names((await lead.agent.get('/api/sprayers?boothId=1').expect(200)).body.items)).toEqual(['Dev Okafor', 'Mina Castell']);
    const refused = await lead.agent.get(`/api/sprayers?boothId=${riversideBooth}`).expect(400);
    expect(refused.body.error.fields).toHaveProperty('boothId');
    expect(names((await admin.agent.get(`/api/sprayers?boothId=${riversideBooth}`).expect(200)).body.items)).toEqual(['Rio Tanaka']);
  });

  it('answers 400 with the field for a booth id that is not a number', async () => {
    const res = await lead.agent.get('/api/sprayers?boothId=booth-one').expect(400);
    expect(res.body.error.fields).toHaveProperty('boothId');
  });
});

describe('assigning the sprayer of a session', () => {
  const slot = { start: '2027-03-01T09:00:00Z', end: '2027-03-01T10:00:00Z' };

  it('lets a lead book without a sprayer, then assign one and reassign another', async () => {
    const booked = await post(lead, '/api/spray-sessions', { boothId: 1, ...slot }).expect(201);
    const id = booked.body.spraySession.id;
    expect(booked.body.spraySession.sprayerId).toBeNull();
    const assigned = await patch(lead, `/api/spray-sessions/${id}`, { sprayerId: 3 }).expect(200);
    expect(assigned.body.spraySession).toMatchObject({ sprayerId: 3, sprayerName: 'Mina Castell' });
    const reassigned = await patch(lead, `/api/spray-sessions/${id}`, { sprayerId: 2 }).expect(200);
    expect(reassigned.body.spraySession).toMatchObject({ sprayerId: 2, sprayerName: 'Dev Okafor' });
    await patch(lead, `/api/spray-sessions/${id}`, { sprayerId: null }).expect(200);
  });

  it('refuses a sprayer of another site, an assembler and a disabled sprayer, naming the field', async () => {
    for (const sprayerId of [riversideSprayer, assemblerId, disabledSprayer]) {
      const res = await post(admin, '/api/spray-sessions', { boothId: 1, start: '2027-03-02T09:00:00Z', end: '2027-03-02T10:00:00Z', sprayerId }).expect(400);
      expect(res.body.error.fields).toHaveProperty('sprayerId');
    }
  });

  it('does not let a sprayer assign a session to themselves', async () => {
    const booked = await post(lead, '/api/spray-sessions', { boothId: 1, start: '2027-03-03T09:00:00Z', end: '2027-03-03T10:00:00Z' }).expect(201);
    const sprayer = await signIn(ctx.app, demo.sprayer);
    await patch(sprayer, `/api/spray-sessions/${booked.body.spraySession.id}`, { sprayerId: 3 }).expect(403);
  });
});

describe('assigning the sprayer of a session booked outside opening hours', () => {
  it('keeps the booking’s reason: only moving it asks again', async () => {
    // 2027-03-06 is a Saturday: booth 1 is closed, so the booking needed a reason.
    const saturday = { boothId: 1, start: '2027-03-06T09:00:00Z', end: '2027-03-06T10:00:00Z', override: { reason: 'Rush order, overtime agreed' } };
    const id = (await post(lead, '/api/spray-sessions', saturday).expect(201)).body.spraySession.id;
    await patch(lead, `/api/spray-sessions/${id}`, { sprayerId: 3 }).expect(200);
    const moved = await patch(lead, `/api/spray-sessions/${id}`, { start: '2027-03-06T11:00:00Z', end: '2027-03-06T12:00:00Z' }).expect(409);
    expect(moved.body.error.code).toBe('outside_opening_hours');
  });
});
