import { pdfBytes, pngBytes } from './fixtures';
import type { Method, RequestSpec } from './route-table';
import type { SiteFixtures } from './site-fixtures';

export const siteRoles = ['lead', 'sprayer', 'assembler'] as const;
export type SiteRole = (typeof siteRoles)[number];

/** A request at the first site's things; a 400 must name one of `fields` (a thing of another site is refused as one that does not exist). */
export interface Attempt extends RequestSpec {
  fields?: string[];
}

/** What the first site holds, looked up by an admin just before a list is checked. */
export interface FirstSite {
  booths: number[];
  racks: number[];
  users: number[];
  spraySessions: number[];
}

/** A JSON body as the checks read it, field by field. */
type Body = ReturnType<typeof JSON.parse>;

/**
 * What a user of the second site gets from the first site's things:
 * `refused`: every attempt answers 403 or 404, or 400 naming the other site's id;
 * `filtered`: 2xx, and `leaks` finds nothing of the first site in the body;
 * `stream`: the live-update stream, checked by its own test below;
 * `group`: the route shows the group's things (jobs, data sheets, settings), the same for every site;
 * `own`: only the caller's own things.
 */
export type OtherSite =
  | { kind: 'refused'; attempts(fx: SiteFixtures, who: SiteRole): Attempt[] | Promise<Attempt[]> }
  | { kind: 'filtered'; attempt(fx: SiteFixtures, who: SiteRole): RequestSpec; leaks(body: Body, fx: SiteFixtures, first: FirstSite): string[] }
  | { kind: 'stream' }
  | { kind: 'group' }
  | { kind: 'own' };

export interface SiteRow {
  method: Method;
  path: string;
  /** The same call on the caller's own site's things: a role allowed the route must get a 2xx. */
  control(fx: SiteFixtures, who: SiteRole): RequestSpec | Promise<RequestSpec>;
  other: OtherSite;
}

const get = (url: string) => () => ({ url });
const refused = (attempts: (fx: SiteFixtures, who: SiteRole) => Attempt[] | Promise<Attempt[]>): OtherSite => ({ kind: 'refused', attempts });
const filtered = (attempt: (fx: SiteFixtures) => RequestSpec, leaks: (body: Body, fx: SiteFixtures, first: FirstSite) => string[]): OtherSite => ({ kind: 'filtered', attempt, leaks });
const group: OtherSite = { kind: 'group' };
const own: OtherSite = { kind: 'own' };
const row = (method: Method, path: string, control: SiteRow['control'], other: OtherSite): SiteRow => ({ method, path, control, other });

/** Items of a list whose value at `key` is one of the first site's ids. */
const leaked = (items: Body[], key: string, ids: number[], what: string) => items.filter((item) => ids.includes(item[key])).map((item) => `${what} ${item[key]}`);
const range = 'from=2027-05-01T00:00:00Z&to=2027-12-31T00:00:00Z';
const reportRange = 'from=2027-05-01&to=2027-06-30';
const booth = (fx: SiteFixtures) => ({ name: `Matrix booth ${fx.next()}`, kind: 'open-face', volumeM3: 40, extractionM3PerH: 12000 });
const slotOn = (boothId: number, fx: SiteFixtures) => ({ boothId, ...fx.freeSlot() });
const csv = 'label,kind,lengthMm,widthMm,thicknessMm,quantity,faces,edges\nShelf 1,shelf,800,300,18,1,both,yes\n';
const denibOn = (spraySessionId: number, partIds: number[]) => ({ spraySessionId, partIds, grit: 'P320', abradedAt: new Date(Date.now() - 60_000).toISOString() });
/** A rack place (on the board, or where a collected part was taken from) on one of the first site's racks. */
const onFirstRack = (place: Body, first: FirstSite) => place !== null && place !== undefined && first.racks.includes(place.id);

/** What a part's history shows of the first site: its place there, or the first site's coats and denibs. */
function historyLeaks(b: Body, fx: SiteFixtures, first: FirstSite): string[] {
  const { readiness, entries } = b.history;
  return [
    ...(onFirstRack(readiness.rack, first) ? [`its place on rack ${readiness.rack.name}`] : []),
    ...(onFirstRack(readiness.collectedFrom, first) ? [`where it was collected from, rack ${readiness.collectedFrom.name}`] : []),
    ...leaked(entries, 'spraySessionId', first.spraySessions, 'entry of session'),
    ...entries.filter((e: Body) => (e.kind === 'coat' && e.id === fx.first.coatId) || (e.kind === 'denib' && e.id === fx.first.denibId)).map((e: Body) => `the first site’s ${e.kind} ${e.id}`),
  ];
}

/**
 * What a second-site board must not show: the first site's sessions, booths, people, sensors, or
 * its job whose only part waits there; and what it must: its own session now, and (to its
 * sprayers) one unassigned session today, its own, not the first site's.
 */
function todayLeaks(body: Body, fx: SiteFixtures, first: FirstSite): string[] {
  const day = body.today;
  if (day.view === 'sprayer') {
    const sessions = [...day.mySessions, ...(day.nextSession ? [day.nextSession] : [])];
    return [...leaked(sessions, 'id', first.spraySessions, 'spray session'), ...(day.unassignedToday === 1 ? [] : [`${day.unassignedToday} unassigned sessions today counted, not the site’s one`])];
  }
  const lists = [...day.recoatClosing, ...day.denibWaiting, ...day.jobsAtRisk];
  return [
    ...leaked(day.sessions, 'id', first.spraySessions, 'spray session'),
    ...leaked(day.booths, 'id', first.booths, 'booth'),
    ...leaked(day.sprayers, 'id', first.users, 'sprayer'),
    ...leaked(day.staleSensors, 'boothId', first.booths, 'sensor of booth'),
    ...leaked(day.recoatClosing, 'bookedSessionId', first.spraySessions, 'booking in spray session'),
    ...lists.filter((entry: Body) => entry.jobId === fx.today.denibJobId).map(() => 'the job whose only part is at the first site'),
    ...(day.sessions.some((s: Body) => s.id === fx.today.second.spraySessionId) ? [] : ['the site’s own session now is missing']),
  ];
}

const bank = (boothId: number, fx: SiteFixtures) => ({ boothId, name: `Matrix bank ${fx.next()}`, kind: 'exhaust', changeAtPa: 300 });
const extractionTest = (boothId: number) => ({ boothId, testedOn: '2025-01-15', faceVelocityPointsMps: [0.5, 0.52], testedBy: 'Matrix Airflow' });
const fireInspection = (boothId: number) => ({ boothId, inspectedOn: '2025-01-15', inspectedBy: 'Matrix Fire', passed: true });
const training = { kind: 'training', doneOn: '2025-01-15', title: 'Matrix training' };
const photoForm = { fields: { subject: 'defect' }, file: { name: 'defect.png', content: pngBytes } };
const reportOf = (body: Body, fx: SiteFixtures) => (body.report?.siteId === fx.second.siteId ? [] : [`report of site ${body.report?.siteId}`]);

export const siteTable: SiteRow[] = [
  row('GET', '/api/health', get('/api/health'), own),
  row('GET', '/api/openapi.json', get('/api/openapi.json'), own),
  row('GET', '/api/auth/csrf', get('/api/auth/csrf'), own),
  row('POST', '/api/auth/login', (_fx, who) => ({ url: '/api/auth/login', body: { email: `${who}.second@larchmere.test`, password: 'second-site-2026' }, ownAgent: true }), own),
  row('POST', '/api/auth/logout', () => ({ url: '/api/auth/logout', ownAgent: true }), own),
  row('GET', '/api/auth/session', get('/api/auth/session'), own),
  row('GET', '/api/auth/me', get('/api/auth/me'), own),
  row('PATCH', '/api/auth/me', () => ({ url: '/api/auth/me', body: { units: 'metric' } }), own),
  row('GET', '/api/notifications', get('/api/notifications'), own),
  row('GET', '/api/mailbox', get('/api/mailbox'), own),
  row('GET', '/api/jobs/parts-template.csv', get('/api/jobs/parts-template.csv'), own),

  row('GET', '/api/users', get('/api/users'), refused(() => [{ url: '/api/users?siteId=1' }])),
  row('POST', '/api/users', (fx) => ({ url: '/api/users', body: { email: `m${fx.next()}@larchmere.test`, name: 'M', role: 'assembler', password: 'matrix-password-1' } }), refused((fx) => [{ url: '/api/users', body: { email: `m${fx.next()}@larchmere.test`, name: 'M', role: 'assembler', password: 'matrix-password-1', siteId: 1 } }])),
  row('PATCH', '/api/users/:id', (fx) => ({ url: `/api/users/${fx.second.sprayerId}`, body: { name: 'Second sprayer' } }), refused((fx) => [{ url: `/api/users/${fx.first.sprayerId}`, body: { name: 'Taken over' } }])),

  row('GET', '/api/sites', get('/api/sites'), group),
  row('POST', '/api/sites', (fx) => ({ url: '/api/sites', body: { name: `Matrix site ${fx.next()}` } }), group),
  row('GET', '/api/sites/:id', (fx) => ({ url: `/api/sites/${fx.first.siteId}` }), group),
  row('PATCH', '/api/sites/:id', (fx) => ({ url: `/api/sites/${fx.second.siteId}`, body: { name: 'Second matrix site' } }), group),

  row('GET', '/api/booths', get('/api/booths?pageSize=200'), filtered(() => ({ url: '/api/booths?pageSize=200&siteId=1' }), (b, _fx, first) => leaked(b.items, 'id', first.booths, 'booth'))),
  row('POST', '/api/booths', (fx) => ({ url: '/api/booths', body: booth(fx) }), refused((fx) => [{ url: '/api/booths', body: { ...booth(fx), siteId: fx.first.siteId }, fields: ['siteId'] }])),
  row('GET', '/api/booths/:id', (fx) => ({ url: `/api/booths/${fx.second.boothId}` }), refused((fx) => [{ url: `/api/booths/${fx.first.boothId}` }])),
  row('PATCH', '/api/booths/:id', (fx) => ({ url: `/api/booths/${fx.second.boothId}`, body: { sprayRateM2PerH: 20 } }), refused((fx) => [{ url: `/api/booths/${fx.first.boothId}`, body: { sprayRateM2PerH: 20 } }, { url: `/api/booths/${fx.second.boothId}`, body: { siteId: fx.first.siteId }, fields: ['siteId'] }])),
  row('POST', '/api/booths/:id/sensor-token', (fx) => ({ url: `/api/booths/${fx.second.boothId}/sensor-token` }), refused((fx) => [{ url: `/api/booths/${fx.first.boothId}/sensor-token` }])),

  row('GET', '/api/racks', get('/api/racks?pageSize=200'), filtered(() => ({ url: '/api/racks?pageSize=200&siteId=1' }), (b, _fx, first) => leaked(b.items, 'id', first.racks, 'rack'))),
  row('POST', '/api/racks', (fx) => ({ url: '/api/racks', body: { name: `Matrix rack ${fx.next()}` } }), refused((fx) => [{ url: '/api/racks', body: { name: `Matrix rack ${fx.next()}`, siteId: fx.first.siteId }, fields: ['siteId'] }])),
  row('GET', '/api/racks/:id', (fx) => ({ url: `/api/racks/${fx.second.rackId}` }), refused((fx) => [{ url: `/api/racks/${fx.first.rackId}` }])),
  row('PATCH', '/api/racks/:id', (fx) => ({ url: `/api/racks/${fx.second.rackId}`, body: { dryingTempC: 22 } }), refused((fx) => [{ url: `/api/racks/${fx.first.rackId}`, body: { dryingTempC: 22 } }])),

  row('GET', '/api/settings', get('/api/settings'), group),
  row('PATCH', '/api/settings', () => ({ url: '/api/settings', body: { shopName: 'Larchmere Joinery' } }), group),
  row('GET', '/api/audit', get('/api/audit?pageSize=200'), filtered(() => ({ url: '/api/audit?pageSize=200&siteId=1' }), (b, _fx, first) => {
    const about: Record<string, number[]> = { booth: first.booths, rack: first.racks, user: first.users, 'spray-session': first.spraySessions };
    return b.items.filter((e: Body) => about[e.entity]?.includes(Number(e.entityId))).map((e: Body) => `audit entry ${e.id} about ${e.entity} ${e.entityId}`);
  })),

  row('GET', '/api/products', get('/api/products'), group),
  row('POST', '/api/products', (fx) => ({ url: '/api/products', body: { name: `Matrix clear ${fx.next()}`, kind: 'clear', chemistry: 'water-borne', volumeSolidsPct: 35, dryingTimes: [{ tempC: 20, flashOffMin: 10, recoatMinMin: 60, recoatMaxMin: 600, touchDryMin: 20, handleMin: 90, packMin: 300, fullCureH: 168 }] } }), group),
  row('GET', '/api/products/:id', (fx) => ({ url: `/api/products/${fx.productId}` }), group),
  row('PATCH', '/api/products/:id', (fx) => ({ url: `/api/products/${fx.productId}`, body: { makerRef: 'KP-200' } }), group),
  row('POST', '/api/products/:id/lots', (fx) => ({ url: `/api/products/${fx.productId}/lots`, body: { lotNumber: `SM-${fx.next()}` } }), group),
  row('POST', '/api/products/:id/documents', (fx) => ({ url: `/api/products/${fx.productId}/documents`, form: { fields: { kind: 'sds' }, file: { name: 'sheet.pdf', content: pdfBytes } } }), group),
  row('GET', '/api/files/:id', (fx) => ({ url: `/api/files/${fx.fileId}` }), group),
  row('GET', '/api/finish-systems', get('/api/finish-systems'), group),
  row('POST', '/api/finish-systems', (fx) => ({ url: '/api/finish-systems', body: { name: `Matrix system ${fx.next()}`, steps: [{ kind: 'coat', productId: fx.productId, dryFilmUm: 40 }] } }), group),
  row('GET', '/api/finish-systems/:id', (fx) => ({ url: `/api/finish-systems/${fx.finishSystemId}` }), group),
  row('PATCH', '/api/finish-systems/:id', (fx) => ({ url: `/api/finish-systems/${fx.finishSystemId}`, body: { description: 'For the site matrix' } }), group),

  row('GET', '/api/jobs', get('/api/jobs'), group),
  row('POST', '/api/jobs', (fx) => ({ url: '/api/jobs', body: { customer: 'Matrix Ltd', reference: `SM-${fx.next()}`, dueDate: '2027-07-01' } }), group),
  row('GET', '/api/jobs/:id', (fx) => ({ url: `/api/jobs/${fx.jobId}` }), group),
  row('PATCH', '/api/jobs/:id', (fx) => ({ url: `/api/jobs/${fx.jobId}`, body: { sheen: 'Satin 30' } }), group),
  row('GET', '/api/jobs/:id/estimate', (fx) => ({ url: `/api/jobs/${fx.jobId}/estimate` }), group),
  row('POST', '/api/jobs/:id/parts/import', (fx) => ({ url: `/api/jobs/${fx.jobId}/parts/import`, form: { fields: { preview: 'true' }, file: { name: 'cut.csv', content: Buffer.from(csv) } } }), group),

  row('GET', '/api/jobs/:id/parts', (fx) => ({ url: `/api/jobs/${fx.jobId}/parts` }), filtered((fx) => ({ url: `/api/jobs/${fx.jobId}/parts` }), (b, _fx, first) => leaked(b.items, 'rackId', first.racks, 'part on rack'))),
  row('POST', '/api/jobs/:id/parts', (fx) => ({ url: `/api/jobs/${fx.jobId}/parts`, body: { label: `Filler ${fx.next()}`, lengthMm: 700, widthMm: 60, thicknessMm: 18, rackId: fx.second.rackId, shelf: 2 } }), refused((fx) => [{ url: `/api/jobs/${fx.jobId}/parts`, body: { label: `Filler ${fx.next()}`, lengthMm: 700, widthMm: 60, thicknessMm: 18, rackId: fx.first.rackId, shelf: 2 }, fields: ['rackId'] }])),
  row('GET', '/api/parts', (fx) => ({ url: `/api/parts?ids=${fx.second.placedPartId}` }), filtered((fx) => ({ url: `/api/parts?ids=${fx.first.placedPartId}` }), (b, _fx, first) => leaked(b.items, 'rackId', first.racks, 'part on rack'))),
  row('GET', '/api/parts/by-tag/:tag', (fx) => ({ url: `/api/parts/by-tag/${fx.second.placedPartTag}` }), filtered((fx) => ({ url: `/api/parts/by-tag/${fx.first.placedPartTag}` }), (b, _fx, first) => leaked([b.part], 'rackId', first.racks, 'part on rack'))),
  row('GET', '/api/parts/:id', (fx) => ({ url: `/api/parts/${fx.second.placedPartId}` }), filtered((fx) => ({ url: `/api/parts/${fx.first.placedPartId}` }), (b, _fx, first) => leaked([b.part], 'rackId', first.racks, 'part on rack'))),
  row('GET', '/api/parts/:id/history', (fx) => ({ url: `/api/parts/${fx.second.placedPartId}/history` }), filtered((fx) => ({ url: `/api/parts/${fx.first.placedPartId}/history` }), historyLeaks)),
  row('PATCH', '/api/parts/:id', async (fx) => ({ url: `/api/parts/${await fx.freshPart()}`, body: { rackId: fx.second.rackId, shelf: 3 } }), refused(async (fx) => [
    { url: `/api/parts/${await fx.freshPart()}`, body: { rackId: fx.first.rackId, shelf: 3 }, fields: ['rackId'] },
    { url: `/api/parts/${fx.first.placedPartId}`, body: { label: 'Taken over' } },
  ])),
  row('POST', '/api/parts/:id/collect', (fx) => ({ url: `/api/parts/${fx.second.placedPartId}/collect` }), refused((fx) => [{ url: `/api/parts/${fx.first.placedPartId}/collect` }])),
  row('DELETE', '/api/parts/:id/collect', (fx) => ({ url: `/api/parts/${fx.second.placedPartId}/collect` }), refused((fx) => [{ url: `/api/parts/${fx.first.placedPartId}/collect` }])),

  row('GET', '/api/sprayers', get('/api/sprayers'), filtered(() => ({ url: '/api/sprayers?siteId=1' }), (b, _fx, first) => leaked(b.items, 'id', first.users, 'user'))),
  row('GET', '/api/spray-sessions', get(`/api/spray-sessions?${range}`), filtered(() => ({ url: `/api/spray-sessions?${range}&siteId=1` }), (b, _fx, first) => leaked(b.items, 'id', first.spraySessions, 'spray session'))),
  row('POST', '/api/spray-sessions', (fx) => ({ url: '/api/spray-sessions', body: { ...slotOn(fx.second.boothId, fx), sprayerId: fx.second.sprayerId } }), refused((fx) => [
    { url: '/api/spray-sessions', body: slotOn(fx.first.boothId, fx), fields: ['boothId'] },
    { url: '/api/spray-sessions', body: { ...slotOn(fx.second.boothId, fx), sprayerId: fx.first.sprayerId }, fields: ['sprayerId'] },
  ])),
  row('GET', '/api/spray-sessions/:id', (fx) => ({ url: `/api/spray-sessions/${fx.second.spraySessionId}` }), refused((fx) => [{ url: `/api/spray-sessions/${fx.first.spraySessionId}` }])),
  row('PATCH', '/api/spray-sessions/:id', (fx) => ({ url: `/api/spray-sessions/${fx.second.spraySessionId}`, body: { notes: 'Masking checked' } }), refused((fx, who) => [
    { url: `/api/spray-sessions/${fx.first.spraySessionId}`, body: { notes: 'Taken over' } },
    ...(who === 'lead' ? [{ url: `/api/spray-sessions/${fx.second.spraySessionId}`, body: { sprayerId: fx.first.sprayerId }, fields: ['sprayerId'] }] : []),
  ])),
  row('GET', '/api/spray-sessions/:id/cautions', (fx) => ({ url: `/api/spray-sessions/${fx.second.spraySessionId}/cautions` }), refused((fx) => [{ url: `/api/spray-sessions/${fx.first.spraySessionId}/cautions` }])),
  row('GET', '/api/spray-sessions/:id/mixes', (fx) => ({ url: `/api/spray-sessions/${fx.second.spraySessionId}/mixes` }), refused((fx) => [{ url: `/api/spray-sessions/${fx.first.spraySessionId}/mixes` }])),
  row('POST', '/api/spray-sessions/:id/mixes', (fx) => ({ url: `/api/spray-sessions/${fx.second.spraySessionId}/mixes`, body: { productId: fx.productId, wantedL: 1, tempC: 20 } }), refused((fx) => [{ url: `/api/spray-sessions/${fx.first.spraySessionId}/mixes`, body: { productId: fx.productId, wantedL: 1, tempC: 20 } }])),
  row('POST', '/api/planner/proposals', (fx) => ({ url: '/api/planner/proposals', body: { jobIds: [fx.jobId], horizonDays: 2 } }), filtered((fx) => ({ url: '/api/planner/proposals?siteId=1', body: { jobIds: [fx.jobId], horizonDays: 2 } }), (b, fx, first) => [
    ...leaked(b.plan.sessions, 'boothId', first.booths, 'planned into booth'),
    ...b.plan.sessions.filter((s: Body) => s.partIds.includes(fx.first.placedPartId)).map(() => 'planned the part on the first site’s rack'),
  ])),
  row('POST', '/api/planner/accept', (fx) => ({ url: '/api/planner/accept', body: { sessions: [slotOn(fx.second.boothId, fx)] } }), refused((fx) => [{ url: '/api/planner/accept', body: { sessions: [slotOn(fx.first.boothId, fx)] }, fields: ['boothId'] }])),

  row('GET', '/api/today', get('/api/today'), filtered(() => ({ url: '/api/today?siteId=1' }), todayLeaks)),

  row('GET', '/api/coats', get('/api/coats?pageSize=500'), filtered((fx) => ({ url: `/api/coats?pageSize=500&spraySessionId=${fx.first.spraySessionId}&siteId=1` }), (b, _fx, first) => leaked(b.items, 'spraySessionId', first.spraySessions, 'coat of session'))),
  row('POST', '/api/coats', async (fx) => ({ url: '/api/coats', body: await fx.coatBody(fx.second) }), refused(async (fx) => [{ url: '/api/coats', body: await fx.coatBody(fx.first), fields: ['spraySessionId'] }])),
  row('GET', '/api/coats/:id', (fx) => ({ url: `/api/coats/${fx.second.coatId}` }), refused((fx) => [{ url: `/api/coats/${fx.first.coatId}` }])),
  row('POST', '/api/coats/:id/corrections', async (fx) => ({ url: `/api/coats/${await fx.secondSiteCoat()}/corrections`, body: { reason: 'Wrong notes', notes: 'Corrected' } }), refused((fx) => [{ url: `/api/coats/${fx.first.coatId}/corrections`, body: { reason: 'Wrong notes', notes: 'Rewritten' } }])),
  row('GET', '/api/ready', get('/api/ready'), filtered((fx) => ({ url: `/api/ready?jobId=${fx.jobId}&siteId=1` }), (b, fx, first) => [
    ...b.items.filter((p: Body) => onFirstRack(p.rack, first)).map((p: Body) => `part ${p.id} on rack ${p.rack.name}`),
    ...b.items.filter((p: Body) => onFirstRack(p.collectedFrom, first)).map((p: Body) => `part ${p.id} collected from rack ${p.collectedFrom.name}`),
    ...b.items.filter((p: Body) => p.id === fx.first.placedPartId).map(() => 'the part on the first site’s rack'),
  ])),
  row('GET', '/api/ready/summary', get('/api/ready/summary'), filtered(() => ({ url: '/api/ready/summary?siteId=1&jobs=24&next=24' }), (b, fx, first) => [
    ...b.summary.nextReady.filter((p: Body) => onFirstRack(p.rack, first) || p.id === fx.first.placedPartId).map((p: Body) => `part ${p.id} of the first site`),
    ...b.summary.jobs.filter((j: Body) => j.jobId === fx.today.denibJobId).map(() => 'the job whose only part is on the first site'),
    ...b.summary.waitingJobs.filter((j: Body) => j.jobReference === 'SITE-MATRIX-DENIB').map(() => 'the first site’s job in the waiting line'),
  ])),
  row('POST', '/api/denibs', (fx) => ({ url: '/api/denibs', body: denibOn(fx.second.spraySessionId, [fx.second.placedPartId]) }), refused((fx) => [
    { url: '/api/denibs', body: denibOn(fx.first.spraySessionId, [fx.first.placedPartId]), fields: ['spraySessionId'] },
    { url: '/api/denibs', body: denibOn(fx.second.spraySessionId, [fx.first.placedPartId]), fields: ['partIds'] },
  ])),
  row('GET', '/api/denibs', get('/api/denibs?pageSize=500'), filtered((fx) => ({ url: `/api/denibs?pageSize=500&spraySessionId=${fx.first.spraySessionId}&siteId=1` }), (b, fx, first) => [
    ...leaked(b.items, 'spraySessionId', first.spraySessions, 'denib of session'),
    ...b.items.filter((d: Body) => d.id === fx.first.denibId).map(() => 'the first site’s denib'),
  ])),
  row('GET', '/api/readings', get('/api/readings'), filtered((fx) => ({ url: `/api/readings?boothId=${fx.first.boothId}&siteId=1` }), (b, _fx, first) => [...leaked(b.items, 'boothId', first.booths, 'reading of booth'), ...leaked(b.items, 'rackId', first.racks, 'reading of rack')])),
  row('POST', '/api/readings', (fx) => ({ url: '/api/readings', body: { boothId: fx.second.boothId, airTempC: 19, relativeHumidityPct: 55 } }), refused((fx) => [
    { url: '/api/readings', body: { boothId: fx.first.boothId, airTempC: 19, relativeHumidityPct: 55 }, fields: ['boothId'] },
    { url: '/api/readings', body: { rackId: fx.first.rackId, airTempC: 19, relativeHumidityPct: 55 }, fields: ['rackId'] },
  ])),
  row('GET', '/api/events', () => ({ url: '/api/events', stream: true }), { kind: 'stream' }),

  ...['booth-use', 'area-sprayed', 'solvent', 'material', 'rework', 'upkeep'].map((report) =>
    row('GET', `/api/reports/${report}`, get(`/api/reports/${report}?${reportRange}`), filtered(() => ({ url: `/api/reports/${report}?${reportRange}&siteId=1` }), (b, fx) => reportOf(b, fx))),
  ),
  row('GET', '/api/reports/conditions', (fx) => ({ url: `/api/reports/conditions?${reportRange}&boothId=${fx.second.boothId}` }), refused((fx) => [{ url: `/api/reports/conditions?${reportRange}&boothId=${fx.first.boothId}` }])),

  row('GET', '/api/booths/:id/upkeep', (fx) => ({ url: `/api/booths/${fx.second.boothId}/upkeep` }), refused((fx) => [{ url: `/api/booths/${fx.first.boothId}/upkeep` }])),
  row('GET', '/api/upkeep/due', get('/api/upkeep/due'), filtered(() => ({ url: '/api/upkeep/due?siteId=1' }), (b, _fx, first) => [...leaked(b.due.booths, 'boothId', first.booths, 'booth'), ...leaked(b.due.crew, 'userId', first.users, 'person')])),
  row('POST', '/api/filter-banks', (fx) => ({ url: '/api/filter-banks', body: bank(fx.second.boothId, fx) }), refused((fx) => [{ url: '/api/filter-banks', body: bank(fx.first.boothId, fx), fields: ['boothId'] }])),
  row('PATCH', '/api/filter-banks/:id', (fx) => ({ url: `/api/filter-banks/${fx.second.filterBankId}`, body: { changeAtPa: 260 } }), refused((fx) => [{ url: `/api/filter-banks/${fx.first.filterBankId}`, body: { changeAtPa: 999 } }])),
  row('POST', '/api/readings/filter-gauge', (fx) => ({ url: '/api/readings/filter-gauge', body: { filterBankId: fx.second.filterBankId, pressureDropPa: 90 } }), refused((fx) => [{ url: '/api/readings/filter-gauge', body: { filterBankId: fx.first.filterBankId, pressureDropPa: 90 }, fields: ['filterBankId'] }])),
  row('POST', '/api/filter-changes', (fx) => ({ url: '/api/filter-changes', body: { filterBankId: fx.second.filterBankId } }), refused((fx) => [{ url: '/api/filter-changes', body: { filterBankId: fx.first.filterBankId }, fields: ['filterBankId'] }])),
  row('POST', '/api/extraction-tests', (fx) => ({ url: '/api/extraction-tests', body: extractionTest(fx.second.boothId) }), refused((fx) => [{ url: '/api/extraction-tests', body: extractionTest(fx.first.boothId), fields: ['boothId'] }])),
  row('POST', '/api/fire-inspections', (fx) => ({ url: '/api/fire-inspections', body: fireInspection(fx.second.boothId) }), refused((fx) => [{ url: '/api/fire-inspections', body: fireInspection(fx.first.boothId), fields: ['boothId'] }])),
  row('GET', '/api/crew', get('/api/crew'), filtered(() => ({ url: '/api/crew?siteId=1' }), (b, _fx, first) => leaked(b.items, 'userId', first.users, 'person'))),
  row('GET', '/api/crew/:userId', (fx, who) => ({ url: `/api/crew/${fx.peopleIds[who]}` }), refused((fx) => [{ url: `/api/crew/${fx.first.sprayerId}` }])),
  row('POST', '/api/crew/:userId/records', (fx) => ({ url: `/api/crew/${fx.second.sprayerId}/records`, body: training }), refused((fx) => [{ url: `/api/crew/${fx.first.sprayerId}/records`, body: training }])),
  row('GET', '/api/spray-sessions/:id/fitness', (fx) => ({ url: `/api/spray-sessions/${fx.second.spraySessionId}/fitness` }), refused((fx) => [{ url: `/api/spray-sessions/${fx.first.spraySessionId}/fitness` }])),
  row('POST', '/api/coats/:id/photos', (fx) => ({ url: `/api/coats/${fx.second.coatId}/photos`, form: photoForm }), refused((fx) => [{ url: `/api/coats/${fx.first.coatId}/photos`, form: photoForm }])),
  row('GET', '/api/coat-photos', (fx) => ({ url: `/api/coat-photos?coatIds=${fx.second.coatId}` }), filtered((fx) => ({ url: `/api/coat-photos?coatIds=${fx.first.coatId},${fx.second.coatId}` }), (b, fx) => b.items.filter((p: Body) => p.coatId === fx.first.coatId).map((p: Body) => `photo ${p.id} of the first site’s coat`))),
  row('GET', '/api/coat-photos/:id', (fx) => ({ url: `/api/coat-photos/${fx.second.photoId}` }), refused((fx) => [{ url: `/api/coat-photos/${fx.first.photoId}` }])),
];
