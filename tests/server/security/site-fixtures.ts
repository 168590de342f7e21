import type { Express } from 'express';
import { demo, signIn, type SignedIn } from '../../helpers/test-app';
import { pngBytes } from './fixtures';

/** One site's records for the site matrix: a booth and rack free at any hour, a session, a coat, a denib, a reading and a part on its rack. */
export interface SiteSide {
  siteId: number;
  boothId: number;
  rackId: number;
  sprayerId: number;
  spraySessionId: number;
  coatId: number;
  /** A denib of the placed part in this site's session. */
  denibId: number;
  /** A part standing on this site's rack, coated in this site's session. */
  placedPartId: number;
  placedPartTag: string;
  /** A filter bank of this site's booth, and a photo of this site's coat. */
  filterBankId: number;
  photoId: number;
}

/** One site's things on today's board: a session under way now that nobody has been given. */
export interface TodaySide {
  spraySessionId: number;
}

export interface SiteFixtures {
  first: SiteSide;
  second: SiteSide;
  /** Today's board: each site's session now, and a job whose only part waits for its denib at the first site. */
  today: { first: TodaySide; second: TodaySide; denibJobId: number };
  /** The job the placed parts belong to (jobs are the group's). */
  jobId: number;
  productId: number;
  fileId: number;
  finishSystemId: number;
  /** The second site's people; the first site's are the demo users. */
  people: Record<'lead' | 'sprayer' | 'assembler', SignedIn>;
  peopleIds: Record<'lead' | 'sprayer' | 'assembler', number>;
  admin: SignedIn;
  next(): number;
  /** An hour on a booth of either site that no other call overlaps. */
  freeSlot(): { start: string; end: string };
  /** A part of the job on no rack and never coated. */
  freshPart(): Promise<number>;
  /** The body of a first coat on a fresh part in the given site's session. */
  coatBody(side: SiteSide): Promise<Record<string, unknown>>;
  /** A current coat of the second site, for a correction. */
  secondSiteCoat(): Promise<number>;
}

const post = (who: SignedIn, url: string, body: object) => who.agent.post(url).set('x-csrf-token', who.csrf).send(body);

/** A JSON body as the tests read it, field by field. */
type Json = ReturnType<typeof JSON.parse>;

async function ok<T = Json>(pending: PromiseLike<{ status: number; body: T }>, what: string): Promise<T> {
  const res = await pending;
  if (res.status >= 300) throw new Error(`Site fixture "${what}" answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body;
}

const booth = (name: string) => ({ name, kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 });
const rack = (name: string) => ({ name, shelves: 10, shelfAreaM2: 1 });
const password = 'second-site-2026';

interface Shared {
  admin: SignedIn;
  jobId: number;
  productId: number;
  next(): number;
  freeSlot(): { start: string; end: string };
  freshPart(rackId?: number): Promise<{ id: number; tag: string }>;
}

/** A coat now (a window around the present is all a coat may claim) on the given parts. */
const coatOn = (spraySessionId: number, partIds: number[], productId: number) => ({
  spraySessionId,
  partIds,
  productId,
  sprayedAt: new Date(Date.now() - 60_000).toISOString(),
  airTempC: 20,
  relativeHumidityPct: 50,
  surfaceTempC: 19,
});

async function buildSide(shared: Shared, siteId: number, sprayerId: number, label: string): Promise<SiteSide> {
  const { admin } = shared;
  const boothId = (await ok(post(admin, '/api/booths', { ...booth(`${label} matrix booth`), siteId }), `${label} booth`)).booth.id;
  const rackId = (await ok(post(admin, '/api/racks', { ...rack(`${label} matrix rack`), siteId }), `${label} rack`)).rack.id;
  const spraySessionId = (await ok(post(admin, '/api/spray-sessions', { boothId, ...shared.freeSlot(), sprayerId }), `${label} session`)).spraySession.id;
  const placed = await shared.freshPart(rackId);
  const coatId = (await ok(post(admin, '/api/coats', coatOn(spraySessionId, [placed.id], shared.productId)), `${label} coat`)).coat.id;
  const denibId = (await ok(post(admin, '/api/denibs', { spraySessionId, partIds: [placed.id], grit: 'P320', abradedAt: new Date(Date.now() - 30_000).toISOString() }), `${label} denib`)).denib.id;
  await ok(post(admin, '/api/readings', { boothId, airTempC: 19, relativeHumidityPct: 55 }), `${label} reading`);
  await ok(post(admin, `/api/spray-sessions/${spraySessionId}/mixes`, { productId: shared.productId, wantedL: 1, tempC: 20 }), `${label} mix`);
  const filterBankId = (await ok(post(admin, '/api/filter-banks', { boothId, name: `${label} arrestor pads`, kind: 'paint-arrestor', changeAtPa: 250 }), `${label} filter bank`)).filterBank.id;
  const photo = await admin.agent.post(`/api/coats/${coatId}/photos`).set('x-csrf-token', admin.csrf).field('subject', 'defect').attach('file', pngBytes, 'defect.png');
  if (photo.status !== 201) throw new Error(`Site fixture "${label} photo" answered ${photo.status}`);
  return { siteId, boothId, rackId, sprayerId, spraySessionId, coatId, denibId, placedPartId: placed.id, placedPartTag: placed.tag, filterBankId, photoId: photo.body.photo.id };
}

async function secondSitePeople(app: Express, admin: SignedIn, siteId: number): Promise<{ people: SiteFixtures['people']; peopleIds: SiteFixtures['peopleIds']; sprayerId: number }> {
  const peopleIds = { lead: 0, sprayer: 0, assembler: 0 };
  for (const role of ['lead', 'sprayer', 'assembler'] as const) {
    const user = await ok(post(admin, '/api/users', { email: `${role}.second@larchmere.test`, name: `Second ${role}`, role, password, siteId }), `second ${role}`);
    peopleIds[role] = user.user.id;
  }
  const sprayerId = peopleIds.sprayer;
  const people = {
    lead: await signIn(app, 'lead.second@larchmere.test', password),
    sprayer: await signIn(app, 'sprayer.second@larchmere.test', password),
    assembler: await signIn(app, 'assembler.second@larchmere.test', password),
  };
  return { people, peopleIds, sprayerId };
}

/** An hour around now on the side's booth, given to nobody, so it is on today's board (and the sprayers' count of unassigned sessions). */
async function bookNow(admin: SignedIn, side: SiteSide, label: string): Promise<TodaySide> {
  const start = Date.now() - 5 * 60_000;
  const slot = { boothId: side.boothId, start: new Date(start).toISOString(), end: new Date(start + 3600_000).toISOString() };
  return { spraySessionId: (await ok(post(admin, '/api/spray-sessions', slot), `${label} session today`)).spraySession.id };
}

/** A job of the first site only: primer, denib, topcoat, its one part primed on the first site's rack, so its denib is due there. */
async function denibJobOnFirstSite(shared: Shared, first: SiteSide, topcoatId: number): Promise<number> {
  const steps = [{ kind: 'coat', productId: shared.productId, dryFilmUm: 50 }, { kind: 'abrade', grit: 'P320' }, { kind: 'coat', productId: topcoatId, dryFilmUm: 40 }];
  const systemId = (await ok(post(shared.admin, '/api/finish-systems', { name: 'Site matrix primed system', steps }), 'primed system')).finishSystem.id;
  const jobId = (await ok(post(shared.admin, '/api/jobs', { customer: 'Matrix Ltd', reference: 'SITE-MATRIX-DENIB', dueDate: '2027-07-01', finishSystemId: systemId }), 'denib job')).job.id;
  const part = (await ok(post(shared.admin, `/api/jobs/${jobId}/parts`, { label: 'Matrix door', lengthMm: 700, widthMm: 400, thicknessMm: 18, rackId: first.rackId, shelf: 4 }), 'denib part')).part;
  await ok(post(shared.admin, '/api/coats', coatOn(first.spraySessionId, [part.id], shared.productId)), 'denib primer');
  return jobId;
}

/** The demo shop as the first site, and a second site with its own people, booth, rack, session, coat and placed part. */
export async function createSiteFixtures(app: Express): Promise<SiteFixtures> {
  const admin = await signIn(app, demo.admin);
  let counter = 0;
  const next = () => ++counter;
  const slotBase = Date.parse('2027-06-01T00:00:00Z');
  const freeSlot = () => {
    const start = slotBase + next() * 2 * 3600_000;
    return { start: new Date(start).toISOString(), end: new Date(start + 3600_000).toISOString() };
  };
  const primer = (await ok(admin.agent.get('/api/products?q=PU%20Primer'), 'primer')).items[0];
  const topcoat = (await ok(admin.agent.get('/api/products?q=PU%20Topcoat'), 'topcoat')).items[0];
  const finishSystemId = (await ok(post(admin, '/api/finish-systems', { name: 'Site matrix system', steps: [{ kind: 'coat', productId: primer.id, dryFilmUm: 50 }] }), 'system')).finishSystem.id;
  const jobId = (await ok(post(admin, '/api/jobs', { customer: 'Matrix Ltd', reference: 'SITE-MATRIX', dueDate: '2027-07-01', finishSystemId }), 'job')).job.id;
  const freshPart = async (rackId?: number) => {
    const placement = rackId ? { rackId, shelf: 1 } : {};
    const part = (await ok(post(admin, `/api/jobs/${jobId}/parts`, { label: `Matrix panel ${next()}`, lengthMm: 600, widthMm: 300, thicknessMm: 18, ...placement }), 'part')).part;
    return { id: part.id as number, tag: part.tag as string };
  };
  const shared: Shared = { admin, jobId, productId: primer.id, next, freeSlot, freshPart };
  const demoSprayerId = (await ok((await signIn(app, demo.sprayer)).agent.get('/api/auth/me'), 'demo sprayer')).user.id;
  const first = await buildSide(shared, 1, demoSprayerId, 'First');
  const secondSiteId = (await ok(post(admin, '/api/sites', { name: 'Second matrix site' }), 'second site')).site.id;
  const { people, peopleIds, sprayerId } = await secondSitePeople(app, admin, secondSiteId);
  const second = await buildSide(shared, secondSiteId, sprayerId, 'Second');
  const today = { first: await bookNow(admin, first, 'First'), second: await bookNow(admin, second, 'Second'), denibJobId: await denibJobOnFirstSite(shared, first, topcoat.id) };
  const coatBody = async (side: SiteSide) => coatOn(side.spraySessionId, [(await freshPart()).id], primer.id);
  const secondSiteCoat = async () => (await ok(post(admin, '/api/coats', await coatBody(second)), 'second coat')).coat.id as number;
  const fileId = (topcoat.tdsFile as { id: number }).id;
  return { first, second, today, jobId, productId: primer.id, fileId, finishSystemId, people, peopleIds, admin, next, freeSlot, freshPart: async () => (await freshPart()).id, coatBody, secondSiteCoat };
}
