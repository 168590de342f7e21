import type { Express } from 'express';
import type { Role } from '../../../shared/permissions';
import { pdfBytes, pngBytes, type Fixtures } from './fixtures';

export const audiences = ['signedOut', 'admin', 'lead', 'sprayer', 'assembler'] as const;
export type Audience = (typeof audiences)[number];
export type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestSpec {
  url: string;
  body?: object;
  /** Sent as multipart/form-data instead of JSON. */
  form?: { fields: Record<string, string>; file?: { name: string; content: Buffer } };
  /** A server-sent event stream: read the status and the first bytes, then hang up. */
  stream?: boolean;
  /** Signs in or out: run it on an agent of its own so the shared agents keep their sessions. */
  ownAgent?: boolean;
}

/**
 * How to call one route of the registry (server/registry/api-routes.ts) and what each audience
 * gets. Which routes exist and what each needs come from the registry, not from here.
 */
export interface RouteRow {
  method: Method;
  /** As the registry declares it. */
  path: string;
  /** The answer for each audience; anything but a 2xx for an allowed role says why in `note`. */
  expected: Record<Audience, number>;
  request(fx: Fixtures, audience: Audience): RequestSpec | Promise<RequestSpec>;
  note?: string;
}

/** Statuses in the order signed out, admin, lead, sprayer, assembler. */
function s(signedOut: number, admin: number, lead: number, sprayer: number, assembler: number): Record<Audience, number> {
  return { signedOut, admin, lead, sprayer, assembler };
}

const all = (status: number) => s(status, status, status, status, status);
const row = (method: Method, path: string, expected: Record<Audience, number>, request: RouteRow['request'], note?: string): RouteRow => ({
  method,
  path,
  expected,
  request,
  note,
});
const get = (url: string) => () => ({ url });

export const demoEmails: Record<Exclude<Audience, 'signedOut'>, string> = {
  admin: 'owner@larchmere.test',
  lead: 'lead@larchmere.test',
  sprayer: 'sprayer@larchmere.test',
  assembler: 'assembler@larchmere.test',
};

const dryingRow = { tempC: 20, flashOffMin: 10, recoatMinMin: 60, recoatMaxMin: 600, touchDryMin: 20, handleMin: 90, packMin: 300, fullCureH: 168 };
const reportRange = 'from=2027-05-01&to=2027-06-30';
const csv = 'label,kind,lengthMm,widthMm,thicknessMm,quantity,faces,edges\nShelf 1,shelf,800,300,18,1,both,yes\n';

export const routeTable: RouteRow[] = [
  row('GET', '/api/health', all(200), get('/api/health')),
  row('GET', '/api/openapi.json', all(200), get('/api/openapi.json')),
  row('GET', '/api/auth/csrf', all(200), get('/api/auth/csrf')),
  row('POST', '/api/auth/login', all(200), (_fx, who) => ({ url: '/api/auth/login', body: { email: demoEmails[who === 'signedOut' ? 'assembler' : who], password: 'finish-demo-2026' }, ownAgent: true })),
  row('POST', '/api/auth/logout', all(204), () => ({ url: '/api/auth/logout', ownAgent: true }), 'Signing out twice is harmless, so it needs no sign-in.'),
  row('GET', '/api/auth/session', all(200), get('/api/auth/session'), 'Says who is signed in, or null: a visitor gets an answer, not a refusal.'),
  row('GET', '/api/auth/me', s(401, 200, 200, 200, 200), get('/api/auth/me')),
  row('PATCH', '/api/auth/me', s(401, 200, 200, 200, 200), () => ({ url: '/api/auth/me', body: { units: 'metric' } })),
  row('GET', '/api/users', s(401, 200, 403, 403, 403), get('/api/users')),
  row('POST', '/api/users', s(401, 201, 403, 403, 403), (fx) => ({ url: '/api/users', body: { email: `matrix.${fx.next()}@larchmere.test`, name: 'Matrix Person', role: 'assembler', password: 'matrix-password-1' } })),
  row('PATCH', '/api/users/:id', s(401, 200, 403, 403, 403), (fx) => ({ url: `/api/users/${fx.spareUserId}`, body: { name: 'Spare Person' } })),
  row('GET', '/api/sites', s(401, 200, 200, 200, 200), get('/api/sites')),
  row('POST', '/api/sites', s(401, 201, 403, 403, 403), (fx) => ({ url: '/api/sites', body: { name: `Matrix site ${fx.next()}` } })),
  row('GET', '/api/sites/:id', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/sites/${fx.siteId}` })),
  row('PATCH', '/api/sites/:id', s(401, 200, 403, 403, 403), (fx) => ({ url: `/api/sites/${fx.siteId}`, body: { name: 'Security test site' } })),
  row('GET', '/api/booths', s(401, 200, 200, 200, 200), get('/api/booths')),
  row('POST', '/api/booths', s(401, 201, 201, 403, 403), (fx) => ({ url: '/api/booths', body: { name: `Matrix booth ${fx.next()}`, kind: 'open-face', volumeM3: 40, extractionM3PerH: 12000 } })),
  row('GET', '/api/booths/:id', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/booths/${fx.boothId}` })),
  row('PATCH', '/api/booths/:id', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/booths/${fx.freeBoothId}`, body: { sprayRateM2PerH: 20 } })),
  row('POST', '/api/booths/:id/sensor-token', s(401, 201, 201, 403, 403), (fx) => ({ url: `/api/booths/${fx.freeBoothId}/sensor-token` })),
  row('GET', '/api/racks', s(401, 200, 200, 200, 200), get('/api/racks')),
  row('POST', '/api/racks', s(401, 201, 201, 403, 403), (fx) => ({ url: '/api/racks', body: { name: `Matrix rack ${fx.next()}` } })),
  row('GET', '/api/racks/:id', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/racks/${fx.rackId}` })),
  row('PATCH', '/api/racks/:id', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/racks/${fx.rackId}`, body: { dryingTempC: 24 } })),
  row('GET', '/api/settings', s(401, 200, 200, 200, 200), get('/api/settings')),
  row('PATCH', '/api/settings', s(401, 200, 403, 403, 403), () => ({ url: '/api/settings', body: { shopName: 'Larchmere Joinery' } })),
  row('GET', '/api/audit', s(401, 200, 200, 403, 403), get('/api/audit')),
  row('GET', '/api/products', s(401, 200, 200, 200, 403), get('/api/products')),
  row('POST', '/api/products', s(401, 201, 201, 403, 403), (fx) => ({
    url: '/api/products',
    body: { name: `Matrix clear ${fx.next()}`, kind: 'clear', chemistry: 'water-borne', volumeSolidsPct: 35, dryingTimes: [dryingRow] },
  })),
  row('GET', '/api/products/:id', s(401, 200, 200, 200, 403), (fx) => ({ url: `/api/products/${fx.productId}` })),
  row('PATCH', '/api/products/:id', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/products/${fx.productId}`, body: { makerRef: 'KP-200' } })),
  row('POST', '/api/products/:id/lots', s(401, 201, 201, 403, 403), (fx) => ({ url: `/api/products/${fx.productId}/lots`, body: { lotNumber: `M-${fx.next()}` } })),
  row('POST', '/api/products/:id/documents', s(401, 201, 201, 403, 403), (fx) => ({
    url: `/api/products/${fx.productId}/documents`,
    form: { fields: { kind: 'sds' }, file: { name: 'sheet.pdf', content: pdfBytes } },
  })),
  row('GET', '/api/files/:id', s(401, 200, 200, 200, 403), (fx) => ({ url: `/api/files/${fx.fileId}` })),
  row('GET', '/api/finish-systems', s(401, 200, 200, 200, 200), get('/api/finish-systems')),
  row('POST', '/api/finish-systems', s(401, 201, 201, 403, 403), (fx) => ({
    url: '/api/finish-systems',
    body: { name: `Matrix system ${fx.next()}`, steps: [{ kind: 'coat', productId: fx.productId, dryFilmUm: 40 }] },
  })),
  row('GET', '/api/finish-systems/:id', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/finish-systems/${fx.finishSystemId}` })),
  row('PATCH', '/api/finish-systems/:id', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/finish-systems/${fx.finishSystemId}`, body: { description: 'For the security tests' } })),
  row('GET', '/api/jobs', s(401, 200, 200, 200, 200), get('/api/jobs')),
  row('POST', '/api/jobs', s(401, 201, 201, 403, 403), (fx) => ({ url: '/api/jobs', body: { customer: 'Matrix Ltd', reference: `MX-${fx.next()}`, dueDate: '2027-07-01' } })),
  row('GET', '/api/jobs/parts-template.csv', s(401, 200, 200, 200, 200), get('/api/jobs/parts-template.csv')),
  row('GET', '/api/jobs/:id', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/jobs/${fx.jobId}` })),
  row('PATCH', '/api/jobs/:id', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/jobs/${fx.jobId}`, body: { sheen: 'Satin 30' } })),
  row('GET', '/api/jobs/:id/estimate', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/jobs/${fx.jobId}/estimate` })),
  row('GET', '/api/jobs/:id/parts', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/jobs/${fx.jobId}/parts` })),
  row('POST', '/api/jobs/:id/parts', s(401, 201, 201, 403, 403), (fx) => ({ url: `/api/jobs/${fx.jobId}/parts`, body: { label: `Filler ${fx.next()}`, lengthMm: 700, widthMm: 60, thicknessMm: 18 } })),
  row('POST', '/api/jobs/:id/parts/import', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/jobs/${fx.jobId}/parts/import`, form: { fields: { preview: 'true' }, file: { name: 'cut.csv', content: Buffer.from(csv) } } }), 'A preview: 200 and nothing saved.'),
  row('GET', '/api/parts', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/parts?ids=${fx.partId}` })),
  row('GET', '/api/parts/by-tag/:tag', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/parts/by-tag/${fx.partTag}` })),
  row('GET', '/api/parts/:id', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/parts/${fx.partId}` })),
  row('PATCH', '/api/parts/:id', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/parts/${fx.partId}`, body: { kind: 'panel' } })),
  row('POST', '/api/parts/:id/collect', s(401, 200, 200, 403, 200), (fx) => ({ url: `/api/parts/${fx.partId}/collect` })),
  row('DELETE', '/api/parts/:id/collect', s(401, 200, 200, 403, 200), (fx) => ({ url: `/api/parts/${fx.partId}/collect` })),
  row('GET', '/api/parts/:id/history', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/parts/${fx.partId}/history` })),
  row('GET', '/api/sprayers', s(401, 200, 200, 200, 200), get('/api/sprayers')),
  row('GET', '/api/spray-sessions', s(401, 200, 200, 200, 200), get('/api/spray-sessions')),
  row('POST', '/api/spray-sessions', s(401, 201, 201, 403, 403), (fx) => ({ url: '/api/spray-sessions', body: { boothId: fx.freeBoothId, ...fx.freeSlot() } })),
  row('GET', '/api/spray-sessions/:id', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/spray-sessions/${fx.spraySessionId}` })),
  row('PATCH', '/api/spray-sessions/:id', s(401, 200, 200, 200, 403), (fx) => ({ url: `/api/spray-sessions/${fx.spraySessionId}`, body: { notes: 'Masking checked' } }), 'The sprayer runs this session, so may change its notes.'),
  row('GET', '/api/spray-sessions/:id/cautions', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/spray-sessions/${fx.spraySessionId}/cautions` })),
  row('GET', '/api/spray-sessions/:id/mixes', s(401, 200, 200, 200, 200), (fx) => ({ url: `/api/spray-sessions/${fx.spraySessionId}/mixes` })),
  row('POST', '/api/spray-sessions/:id/mixes', s(401, 201, 201, 201, 403), (fx) => ({ url: `/api/spray-sessions/${fx.spraySessionId}/mixes`, body: { productId: fx.productId, wantedL: 1, tempC: 20 } })),
  row('POST', '/api/planner/proposals', s(401, 200, 200, 403, 403), (fx) => ({ url: '/api/planner/proposals', body: { jobIds: [fx.jobId], horizonDays: 2 } })),
  row('POST', '/api/planner/accept', s(401, 201, 201, 403, 403), (fx) => ({ url: '/api/planner/accept', body: { sessions: [{ boothId: fx.freeBoothId, ...fx.freeSlot() }] } })),
  row('GET', '/api/today', s(401, 200, 200, 200, 403), get('/api/today'), 'The assembler’s day is the ready board.'),
  row('GET', '/api/coats', s(401, 200, 200, 200, 403), get('/api/coats')),
  row('POST', '/api/coats', s(401, 201, 201, 201, 403), (fx) => ({ url: '/api/coats', body: fx.coatBody() })),
  row('GET', '/api/coats/:id', s(401, 200, 200, 200, 403), async (fx) => ({ url: `/api/coats/${await fx.anyCoat()}` })),
  row('POST', '/api/coats/:id/corrections', s(401, 201, 201, 201, 403), async (fx) => ({ url: `/api/coats/${await fx.newCoat()}/corrections`, body: { reason: 'Wrong notes', notes: 'Corrected' } })),
  row('GET', '/api/ready', s(401, 200, 200, 200, 200), get('/api/ready')),
  row('GET', '/api/ready/summary', s(401, 200, 200, 200, 200), get('/api/ready/summary')),
  row('POST', '/api/denibs', s(401, 201, 201, 201, 403), (fx) => ({ url: '/api/denibs', body: { spraySessionId: fx.spraySessionId, partIds: [fx.partId], grit: 'P320', abradedAt: new Date(Date.now() - 60_000).toISOString() } })),
  row('GET', '/api/denibs', s(401, 200, 200, 200, 403), get('/api/denibs')),
  row('GET', '/api/readings', s(401, 200, 200, 200, 200), get('/api/readings')),
  row('POST', '/api/readings', s(401, 201, 201, 201, 403), (fx) => ({ url: '/api/readings', body: { boothId: fx.boothId, airTempC: 19, relativeHumidityPct: 55 } })),
  row('GET', '/api/events', s(401, 200, 200, 200, 200), () => ({ url: '/api/events', stream: true })),
  row('GET', '/api/notifications', s(401, 200, 200, 200, 200), get('/api/notifications')),
  ...['booth-use', 'area-sprayed', 'solvent', 'material', 'rework', 'upkeep'].map((report) => row('GET', `/api/reports/${report}`, s(401, 200, 200, 403, 403), get(`/api/reports/${report}?${reportRange}`))),
  row('GET', '/api/reports/conditions', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/reports/conditions?${reportRange}&boothId=${fx.boothId}` })),
  row('GET', '/api/mailbox', s(401, 404, 403, 403, 403), get('/api/mailbox'), 'Tests run without the development mailbox, so the admin gets 404 not_found.'),
  row('GET', '/api/booths/:id/upkeep', s(401, 200, 200, 200, 403), (fx) => ({ url: `/api/booths/${fx.boothId}/upkeep` })),
  row('GET', '/api/upkeep/due', s(401, 200, 200, 200, 403), get('/api/upkeep/due')),
  row('POST', '/api/filter-banks', s(401, 201, 201, 403, 403), (fx) => ({ url: '/api/filter-banks', body: { boothId: fx.freeBoothId, name: `Matrix bank ${fx.next()}`, kind: 'exhaust', changeAtPa: 300 } })),
  row('PATCH', '/api/filter-banks/:id', s(401, 200, 200, 403, 403), (fx) => ({ url: `/api/filter-banks/${fx.filterBankId}`, body: { changeAtPa: 250 } })),
  row('POST', '/api/readings/filter-gauge', s(401, 201, 201, 201, 403), (fx) => ({ url: '/api/readings/filter-gauge', body: { filterBankId: fx.filterBankId, pressureDropPa: 120 } })),
  row('POST', '/api/filter-changes', s(401, 201, 201, 201, 403), (fx) => ({ url: '/api/filter-changes', body: { filterBankId: fx.filterBankId, beforePa: 240, afterPa: 50 } })),
  row('POST', '/api/extraction-tests', s(401, 201, 201, 403, 403), (fx) => ({ url: '/api/extraction-tests', body: { boothId: fx.freeBoothId, testedOn: '2025-01-15', faceVelocityPointsMps: [0.5, 0.52], testedBy: 'Matrix Airflow' } })),
  row('POST', '/api/fire-inspections', s(401, 201, 201, 403, 403), (fx) => ({ url: '/api/fire-inspections', body: { boothId: fx.freeBoothId, inspectedOn: '2025-01-15', inspectedBy: 'Matrix Fire', passed: true } })),
  row('GET', '/api/crew', s(401, 200, 200, 403, 403), get('/api/crew')),
  row('GET', '/api/crew/:userId', s(401, 200, 200, 200, 403), (fx, who) => ({ url: `/api/crew/${who === 'lead' ? fx.leadId : fx.sprayerId}` }), 'Each asks for a record they may read: the admin the sprayer’s, the lead and the sprayer their own.'),
  row('POST', '/api/crew/:userId/records', s(401, 201, 403, 403, 403), (fx) => ({ url: `/api/crew/${fx.sprayerId}/records`, body: { kind: 'training', doneOn: '2025-01-15', title: 'Matrix training' } })),
  row('GET', '/api/spray-sessions/:id/fitness', s(401, 200, 200, 200, 403), (fx) => ({ url: `/api/spray-sessions/${fx.spraySessionId}/fitness` })),
  row('POST', '/api/coats/:id/photos', s(401, 201, 201, 201, 403), async (fx) => ({ url: `/api/coats/${await fx.anyCoat()}/photos`, form: { fields: { subject: 'sample-board' }, file: { name: 'board.png', content: pngBytes } } }), 'The sprayer runs the coat’s session.'),
  row('GET', '/api/coat-photos', s(401, 200, 200, 200, 403), async (fx) => ({ url: `/api/coat-photos?coatIds=${await fx.anyCoat()}` })),
  row('GET', '/api/coat-photos/:id', s(401, 200, 200, 200, 403), async (fx) => ({ url: `/api/coat-photos/${await fx.anyPhoto()}` })),
];

export const routeKey = (method: string, path: string) => `${method.toUpperCase()} ${path.replace(/\/+$/, '') || '/'}`;

interface RouterLayer {
  route?: { path: string; methods: Record<string, boolean> };
  handle: { stack?: RouterLayer[] };
  rawPath?: unknown;
}

/** Every method + path the app's router answers, found by walking its layers (mounted routers included). */
export function registeredRoutes(app: Express): string[] {
  const found: string[] = [];
  const walk = (stack: RouterLayer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) if (on && method !== '_all') found.push(routeKey(method, prefix + layer.route.path));
      } else if (layer.handle.stack) {
        walk(layer.handle.stack, prefix + (typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : ''));
      }
    }
  };
  walk((app as unknown as { router: { stack: RouterLayer[] } }).router.stack, '');
  return [...new Set(found)].filter((key) => key.includes(' /api'));
}

export const roleOf = (audience: Audience): Role | null => (audience === 'signedOut' ? null : audience);
export const isMutating = (method: Method) => method !== 'GET';
