import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

// Sites: an admin works across them; a lead (and everyone else) sees and plans their own.
let ctx: TestContext;
let admin: SignedIn;
let lead: SignedIn;
let riversideLead: SignedIn;
let riverside: number;
let riversideBooth: number;

const post = (who: SignedIn, path: string, body: object) => who.agent.post(path).set('x-csrf-token', who.csrf).send(body);
const booth = { kind: 'spray-room', volumeM3: 60, extractionM3PerH: 12000 };

beforeAll(async () => {
  ctx = await startTestApp();
  admin = await signIn(ctx.app, demo.admin);
  lead = await signIn(ctx.app, demo.lead);
  riverside = (await post(admin, '/api/sites', { name: 'Riverside works' }).expect(201)).body.site.id;
  riversideBooth = (await post(admin, '/api/booths', { ...booth, name: 'Riverside booth', siteId: riverside }).expect(201)).body.booth.id;
  await post(admin, '/api/users', { email: 'lead.riverside@larchmere.test', name: 'Ravi Okafor', role: 'lead', password: 'riverside-lead-2026', siteId: riverside }).expect(201);
  riversideLead = await signIn(ctx.app, 'lead.riverside@larchmere.test', 'riverside-lead-2026');
});
afterAll(async () => ctx?.close());

describe('sites', () => {
  it('lists sites to everyone and lets only an admin add one, with unique names', async () => {
    const sprayer = await signIn(ctx.app, demo.sprayer);
    const names = (await sprayer.agent.get('/api/sites').expect(200)).body.items.map((s: { name: string }) => s.name);
    expect(names).toEqual(expect.arrayContaining(['Main site', 'Riverside works']));
    await post(sprayer, '/api/sites', { name: 'Shed' }).expect(403);
    await post(lead, '/api/sites', { name: 'Shed' }).expect(403);
    const dup = await post(admin, '/api/sites', { name: 'Riverside works' }).expect(409);
    expect(dup.body.error.fields.name).toBeTruthy();
  });

  it('tells each user their site', async () => {
    expect((await riversideLead.agent.get('/api/auth/me').expect(200)).body.user.siteId).toBe(riverside);
    expect((await lead.agent.get('/api/auth/me').expect(200)).body.user.siteId).toBe(1);
  });

  it('shows a lead only their own site’s booths, and keeps new booths on it', async () => {
    const mine = (await lead.agent.get('/api/booths').expect(200)).body.items;
    expect(mine.map((b: { id: number }) => b.id)).not.toContain(riversideBooth);
    expect(mine.every((b: { siteId: number }) => b.siteId === 1)).toBe(true);
    await lead.agent.get(`/api/booths/${riversideBooth}`).expect(404);
    await lead.agent.patch(`/api/booths/${riversideBooth}`).set('x-csrf-token', lead.csrf).send({ name: 'Taken over' }).expect(404);
    const elsewhere = await post(lead, '/api/booths', { ...booth, name: 'Sneaky booth', siteId: riverside }).expect(403);
    expect(elsewhere.body.error.fields.siteId).toBeTruthy();
    const own = await post(lead, '/api/booths', { ...booth, name: 'Lead booth' }).expect(201);
    expect(own.body.booth.siteId).toBe(1);
    const theirs = (await riversideLead.agent.get('/api/booths').expect(200)).body.items;
    expect(theirs.map((b: { id: number }) => b.id)).toEqual([riversideBooth]);
  });

  it('lets an admin see every site or pick one, and refuses an unknown site', async () => {
    const all = (await admin.agent.get('/api/booths').expect(200)).body.items;
    expect(all.map((b: { id: number }) => b.id)).toContain(riversideBooth);
    const one = (await admin.agent.get(`/api/booths?siteId=${riverside}`).expect(200)).body.items;
    expect(one.map((b: { id: number }) => b.id)).toEqual([riversideBooth]);
    const unknown = await post(admin, '/api/booths', { ...booth, name: 'Nowhere', siteId: 999 }).expect(400);
    expect(unknown.body.error.fields.siteId).toBeTruthy();
  });

  it('plans a site’s booths only: another site’s booth cannot be booked and its sessions are not listed', async () => {
    const slot = { start: '2027-05-03T09:00:00Z', end: '2027-05-03T10:00:00Z' };
    const booked = await post(riversideLead, '/api/spray-sessions', { boothId: riversideBooth, ...slot }).expect(201);
    const refused = await post(lead, '/api/spray-sessions', { boothId: riversideBooth, start: '2027-05-03T11:00:00Z', end: '2027-05-03T12:00:00Z' }).expect(400);
    expect(refused.body.error.fields.boothId).toBeTruthy();
    const range = 'from=2027-05-01T00:00:00Z&to=2027-05-08T00:00:00Z';
    expect((await lead.agent.get(`/api/spray-sessions?${range}`).expect(200)).body.items).toEqual([]);
    await lead.agent.get(`/api/spray-sessions/${booked.body.spraySession.id}`).expect(404);
    expect((await admin.agent.get(`/api/spray-sessions?${range}`).expect(200)).body.items).toHaveLength(1);
  });

  it('splits reports by site', async () => {
    const path = '/api/reports/booth-use?from=2027-05-03&to=2027-05-09';
    const forRiverside = (await admin.agent.get(`${path}&siteId=${riverside}`).expect(200)).body.report;
    expect(forRiverside.siteId).toBe(riverside);
    expect(forRiverside.rows).toEqual([expect.objectContaining({ boothId: riversideBooth, sessions: 1, bookedHours: 1 })]);
    // A lead asking for another site still gets their own.
    const leadView = (await lead.agent.get(`${path}&siteId=${riverside}`).expect(200)).body.report;
    expect(leadView.siteId).toBe(1);
    expect(leadView.rows.some((r: { boothId: number }) => r.boothId === riversideBooth)).toBe(false);
    const group = (await admin.agent.get(path).expect(200)).body.report;
    expect(group.siteId).toBeNull();
    expect(group.rows.some((r: { boothId: number }) => r.boothId === riversideBooth)).toBe(true);
    await request(ctx.app).get(path).expect(401);
  });
});
