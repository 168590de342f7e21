import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

// A door primed and denibbed at the main site, then moved to a second site's rack for its topcoats:
// its readiness follows it, while each site lists only its own coats and denibs.
const clock = { at: new Date('2027-04-05T09:00:00Z'), now() { return this.at; } };
const at = (iso: string) => (clock.at = new Date(iso));

let ctx: TestContext;
let admin: SignedIn;
let mainSprayer: SignedIn;
let mainLead: SignedIn;
let riversideLead: SignedIn;
let riversideSprayer: SignedIn;
let mainSessionId: number;
let riversideSessionId: number;
let riversideRackId: number;
let mainRackId: number;
let doorId: number;
let primerId: number;
let topcoatId: number;

const post = (who: SignedIn, url: string, body: object) => who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const history = async (who: SignedIn) => (await who.agent.get(`/api/parts/${doorId}/history`).expect(200)).body.history;
const coatOn = (spraySessionId: number, productId: number, sprayedAt: string, stepPosition: number) => ({
  spraySessionId,
  partIds: [doorId],
  productId,
  sprayedAt,
  stepPosition,
  airTempC: 20,
  relativeHumidityPct: 50,
  surfaceTempC: 19,
});

async function riversideSite(): Promise<void> {
  const siteId = (await post(admin, '/api/sites', { name: 'Riverside works' }).expect(201)).body.site.id;
  const boothId = (await post(admin, '/api/booths', { name: 'Riverside booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000, siteId }).expect(201)).body.booth.id;
  riversideRackId = (await post(admin, '/api/racks', { name: 'Riverside rack', shelves: 6, shelfAreaM2: 1, siteId }).expect(201)).body.rack.id;
  for (const role of ['lead', 'sprayer'] as const) {
    await post(admin, '/api/users', { email: `${role}.riverside@larchmere.test`, name: `Riverside ${role}`, role, password: 'riverside-works-2026', siteId }).expect(201);
  }
  riversideLead = await signIn(ctx.app, 'lead.riverside@larchmere.test', 'riverside-works-2026');
  riversideSprayer = await signIn(ctx.app, 'sprayer.riverside@larchmere.test', 'riverside-works-2026');
  const sprayerId = (await riversideSprayer.agent.get('/api/auth/me').expect(200)).body.user.id;
  riversideSessionId = (await post(riversideLead, '/api/spray-sessions', { boothId, start: '2027-04-06T09:00:00Z', end: '2027-04-06T12:00:00Z', sprayerId }).expect(201)).body.spraySession.id;
}

beforeAll(async () => {
  ctx = await startTestApp({ clock });
  [admin, mainLead, mainSprayer] = await Promise.all([signIn(ctx.app, demo.admin), signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer)]);
  const mainBoothId = (await post(mainLead, '/api/booths', { name: 'Denib sites booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }).expect(201)).body.booth.id;
  mainRackId = (await mainLead.agent.get('/api/racks').expect(200)).body.items[0].id;
  const mainSprayerId = (await mainSprayer.agent.get('/api/auth/me').expect(200)).body.user.id;
  mainSessionId = (await post(mainLead, '/api/spray-sessions', { boothId: mainBoothId, start: '2027-04-05T09:00:00Z', end: '2027-04-05T12:00:00Z', sprayerId: mainSprayerId }).expect(201)).body.spraySession.id;
  // The demo's painted system: 2K PU primer, denib P320, two 2K PU topcoats.
  const vanity = (await mainLead.agent.get('/api/jobs?q=LJ-26-105').expect(200)).body.items[0];
  const jobId = (await post(mainLead, '/api/jobs', { customer: 'Two Sites Ltd', reference: 'DS-1', dueDate: '2027-04-20', finishSystemId: vanity.finishSystemId }).expect(201)).body.job.id;
  doorId = (await post(mainLead, `/api/jobs/${jobId}/parts`, { label: 'Travelling door', lengthMm: 715, widthMm: 496, thicknessMm: 18, rackId: mainRackId, shelf: 1 }).expect(201)).body.part.id;
  primerId = (await mainLead.agent.get('/api/products?q=PU Primer')).body.items[0].id;
  topcoatId = (await mainLead.agent.get('/api/products?q=PU Topcoat')).body.items[0].id;
  await riversideSite();
});
afterAll(async () => ctx?.close());

describe('denibs and a part’s history across two sites', () => {
  it('keeps the main site’s denib from the other site while the door stands on a main-site rack', async () => {
    await post(mainSprayer, '/api/coats', coatOn(mainSessionId, primerId, '2027-04-05T09:15:00Z', 0)).expect(201);
    at('2027-04-05T11:05:00Z');
    const denib = (await post(mainSprayer, '/api/denibs', { spraySessionId: mainSessionId, partIds: [doorId], grit: 'P320', abradedAt: '2027-04-05T11:00:00Z' }).expect(201)).body.denib;

    expect((await riversideLead.agent.get(`/api/denibs?partId=${doorId}`).expect(200)).body).toMatchObject({ items: [], total: 0 });
    expect((await riversideLead.agent.get(`/api/denibs?spraySessionId=${mainSessionId}`).expect(200)).body.items).toEqual([]);
    expect((await mainLead.agent.get(`/api/denibs?partId=${doorId}`).expect(200)).body.items.map((d: { id: number }) => d.id)).toEqual([denib.id]);

    const seenFromRiverside = await history(riversideLead);
    expect(seenFromRiverside.entries).toEqual([]);
    expect(seenFromRiverside.readiness.rack).toBeNull();
    const seenAtHome = await history(mainLead);
    expect(seenAtHome.entries.map((e: { kind: string }) => e.kind)).toEqual(['coat', 'denib']);
    expect(seenAtHome.readiness.rack).toMatchObject({ id: mainRackId, shelf: 1 });
  });

  it('refuses a denib from the other site on the door while it stands on a main-site rack, and on a main-site session', async () => {
    at('2027-04-06T09:10:00Z');
    const onOurRack = await post(riversideSprayer, '/api/denibs', { spraySessionId: riversideSessionId, partIds: [doorId], grit: 'P320', abradedAt: '2027-04-06T09:05:00Z' }).expect(400);
    expect(onOurRack.body.error.fields).toHaveProperty('partIds');
    const theirSession = await post(riversideLead, '/api/denibs', { spraySessionId: mainSessionId, partIds: [doorId], grit: 'P320', abradedAt: '2027-04-06T09:05:00Z' }).expect(400);
    expect(theirSession.body.error.fields).toHaveProperty('spraySessionId');
    expect((await mainLead.agent.get(`/api/denibs?partId=${doorId}`).expect(200)).body.total).toBe(1);
  });

  it('counts the main site’s denib once the door is at the other site, without listing it there', async () => {
    await admin.agent.patch(`/api/parts/${doorId}`).set('x-csrf-token', admin.csrf).send({ rackId: riversideRackId, shelf: 2 }).expect(200);
    const there = await history(riversideLead);
    expect(there.readiness).toMatchObject({ rack: { id: riversideRackId, shelf: 2 }, abradeRequired: false, denibbedAt: '2027-04-05T11:00:00.000Z', nextStep: 'Coat 2 of 3 at 40 µm dry', nextStepKind: 'coat', nextStepDryFilmUm: 40 });
    expect(there.entries).toEqual([]);
    expect((await riversideLead.agent.get('/api/ready').expect(200)).body.items.map((p: { id: number }) => p.id)).toContain(doorId);

    // A day after the primer its window has closed; the denib step before this topcoat keys it, so no stop.
    at('2027-04-06T10:05:00Z');
    const topcoat = await post(riversideSprayer, '/api/coats', coatOn(riversideSessionId, topcoatId, '2027-04-06T10:00:00Z', 2)).expect(201);
    expect(topcoat.body.coat.warnings.map((w: { code: string }) => w.code)).not.toContain('recoat-window-missed');

    const riversideEntries = (await history(riversideLead)).entries;
    expect(riversideEntries.map((e: { kind: string; spraySessionId: number }) => [e.kind, e.spraySessionId])).toEqual([['coat', riversideSessionId]]);
    const home = await history(mainLead);
    expect(home.readiness.rack).toBeNull();
    expect(home.entries.map((e: { spraySessionId: number }) => e.spraySessionId)).toEqual([mainSessionId, mainSessionId]);
  });

  it('keys the next coat at the main site with the other site’s denib once the door is back', async () => {
    // Four days on, the topcoat's window (about 56 h at 20 °C) has closed: only a denib since lets the last coat on.
    at('2027-04-10T09:00:00Z');
    const scuff = (await post(riversideSprayer, '/api/denibs', { spraySessionId: riversideSessionId, partIds: [doorId], grit: 'P400', abradedAt: '2027-04-10T08:50:00Z' }).expect(201)).body.denib;
    await admin.agent.patch(`/api/parts/${doorId}`).set('x-csrf-token', admin.csrf).send({ rackId: mainRackId, shelf: 3 }).expect(200);
    expect((await history(mainLead)).readiness).toMatchObject({ abradeRequired: false, denibbedAt: '2027-04-10T08:50:00.000Z' });

    at('2027-04-10T09:35:00Z');
    const last = await post(mainSprayer, '/api/coats', coatOn(mainSessionId, topcoatId, '2027-04-10T09:30:00Z', 3)).expect(201);
    expect(last.body.coat.warnings.map((w: { code: string }) => w.code)).not.toContain('recoat-window-missed');
    const home = (await history(mainLead)).entries;
    expect(home.map((e: { spraySessionId: number }) => e.spraySessionId)).toEqual([mainSessionId, mainSessionId, mainSessionId]);
    expect(home.some((e: { kind: string; id: number }) => e.kind === 'denib' && e.id === scuff.id)).toBe(false);
    expect((await riversideLead.agent.get(`/api/denibs?partId=${doorId}`).expect(200)).body.items.map((d: { id: number }) => d.id)).toEqual([scuff.id]);
  });
});
