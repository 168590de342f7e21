import type { Express } from 'express';
import request from 'supertest';
import { demo, signIn, type SignedIn } from '../../helpers/test-app';

/** Ids from the seeded demo shop, plus a few records made for these tests, so allowed roles get 2xx. */
export interface Fixtures {
  sprayerId: number;
  leadId: number;
  /** A filter bank of the demo shop's first booth. */
  filterBankId: number;
  spareUserId: number;
  /** A site made for these tests, so renaming it to its own name touches nothing else. */
  siteId: number;
  boothId: number;
  /** A booth without opening hours: any hour is bookable, so bookings only need distinct times. */
  freeBoothId: number;
  rackId: number;
  productId: number;
  fileId: number;
  finishSystemId: number;
  jobId: number;
  partId: number;
  partTag: string;
  spraySessionId: number;
  /** A number no other call of this run has had: unique names and booking slots. */
  next(): number;
  /** A booking slot of one hour on the free booth that no other call overlaps. */
  freeSlot(): { start: string; end: string };
  /** The body of a coat that can be recorded now: the first coat on a part nobody coated yet. */
  coatBody(): Record<string, unknown>;
  /** A fresh current coat record, for a correction that must not meet a newer version. */
  newCoat(): Promise<number>;
  /** One coat record made on first use and kept. */
  anyCoat(): Promise<number>;
  /** One photo of that coat, made on first use and kept. */
  anyPhoto(): Promise<number>;
}

/** The smallest PNG: a 1 × 1 pixel image (its signature is what the server checks). */
export const pngBytes = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==', 'base64');

export const pdfBytes = Buffer.from('%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');

type Agent = SignedIn['agent'];

async function ok<T>(pending: Promise<{ status: number; body: T }>, what: string): Promise<T> {
  const res = await pending;
  if (res.status >= 300) throw new Error(`Fixture "${what}" answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body;
}

const post = (admin: SignedIn, url: string, body: object) => admin.agent.post(url).set('x-csrf-token', admin.csrf).send(body);

async function findFirst(agent: Agent, url: string, what: string): Promise<{ id: number } & Record<string, unknown>> {
  const body = await ok(agent.get(url), what);
  const item = (body as { items: ({ id: number } & Record<string, unknown>)[] }).items[0];
  if (!item) throw new Error(`Fixture "${what}": nothing found at ${url}`);
  return item;
}

export async function createFixtures(app: Express, admin: SignedIn): Promise<Fixtures> {
  let counter = 0;
  const next = () => ++counter;
  const sprayer = await signIn(app, demo.sprayer);
  const sprayerId: number = (await ok(sprayer.agent.get('/api/auth/me'), 'sprayer')).user.id;
  const leadId: number = (await ok((await signIn(app, demo.lead)).agent.get('/api/auth/me'), 'lead')).user.id;
  const spare = await ok(post(admin, '/api/users', { email: 'spare.person@larchmere.test', name: 'Spare Person', role: 'assembler', password: 'spare-password-1' }), 'spare user');
  const site = await ok(post(admin, '/api/sites', { name: 'Security test site' }), 'site');
  const booth = await findFirst(admin.agent, '/api/booths', 'booth');
  const freeBooth = await ok(post(admin, '/api/booths', { name: 'Security test booth', kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 }), 'free booth');
  const rack = await findFirst(admin.agent, '/api/racks', 'rack');
  const primer = await findFirst(admin.agent, '/api/products?q=PU%20Primer', 'primer');
  const topcoat = await findFirst(admin.agent, '/api/products?q=PU%20Topcoat', 'topcoat');
  const system = await ok(post(admin, '/api/finish-systems', { name: 'Security test system', steps: [{ kind: 'coat', productId: primer.id, dryFilmUm: 50 }] }), 'finish system');
  const kitchen = await findFirst(admin.agent, '/api/jobs?q=LJ-26-101', 'kitchen job');
  const panelling = await findFirst(admin.agent, '/api/jobs?q=LJ-26-103', 'panelling job');
  const doors: { id: number }[] = (await ok(admin.agent.get(`/api/jobs/${kitchen.id}/parts`), 'doors')).items;
  const panel: { id: number; tag: string } = (await ok(admin.agent.get(`/api/jobs/${panelling.id}/parts`), 'panel')).items[0];
  const slotBase = Date.parse('2027-06-01T00:00:00Z');
  const freeSlot = () => {
    const start = slotBase + next() * 2 * 3600_000;
    return { start: new Date(start).toISOString(), end: new Date(start + 3600_000).toISOString() };
  };
  const session = await ok(post(admin, '/api/spray-sessions', { boothId: freeBooth.booth.id, ...freeSlot(), sprayerId }), 'spray session');
  const spraySessionId: number = session.spraySession.id;
  let doorIndex = 0;
  const coatBody = () => {
    const door = doors[doorIndex++];
    if (!door) throw new Error('Fixtures ran out of uncoated doors');
    return { spraySessionId, partIds: [door.id], productId: primer.id, sprayedAt: new Date(Date.now() - 3_600_000).toISOString(), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 };
  };
  const newCoat = async (): Promise<number> => (await ok(post(admin, '/api/coats', coatBody()), 'coat')).coat.id;
  let firstCoat: Promise<number> | undefined;
  let firstPhoto: Promise<number> | undefined;
  const anyCoat = () => (firstCoat ??= newCoat());
  const newPhoto = async (): Promise<number> => {
    const res = await admin.agent.post(`/api/coats/${await anyCoat()}/photos`).set('x-csrf-token', admin.csrf).field('subject', 'defect').attach('file', pngBytes, 'defect.png');
    if (res.status !== 201) throw new Error(`Fixture "photo" answered ${res.status}: ${JSON.stringify(res.body)}`);
    return res.body.photo.id;
  };
  const upkeep = await ok(admin.agent.get(`/api/booths/${booth.id}/upkeep`), 'upkeep');
  return {
    sprayerId,
    leadId,
    filterBankId: upkeep.upkeep.banks[0].id,
    spareUserId: spare.user.id,
    siteId: site.site.id,
    boothId: booth.id,
    freeBoothId: freeBooth.booth.id,
    rackId: rack.id,
    productId: primer.id,
    fileId: (topcoat.tdsFile as { id: number }).id,
    finishSystemId: system.finishSystem.id,
    jobId: kitchen.id,
    partId: panel.id,
    partTag: panel.tag,
    spraySessionId,
    next,
    freeSlot,
    coatBody,
    newCoat,
    anyCoat,
    anyPhoto: () => (firstPhoto ??= newPhoto()),
  };
}

/** An agent with a CSRF token and no user: what a browser has before signing in. */
export async function signedOutAgent(app: Express): Promise<SignedIn> {
  const agent = request.agent(app);
  const res = await agent.get('/api/auth/csrf').expect(200);
  return { agent, csrf: res.body.token as string };
}
