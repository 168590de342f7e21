import type { DataSource } from 'typeorm';
import { CoatPartEntity } from '../../../server/db/entities/coat-part.entity';
import { CoatEntity } from '../../../server/db/entities/coat.entity';
import { MixEntity } from '../../../server/db/entities/mix.entity';
import { PartEntity } from '../../../server/db/entities/part.entity';
import { ReadingEntity } from '../../../server/db/entities/reading.entity';
import { SpraySessionEntity } from '../../../server/db/entities/spray-session.entity';
import type { SignedIn } from '../../helpers/test-app';

/**
 * A small, hand-countable week in March 2025 (Europe/London; the clocks went forward on Sunday
 * 30 March at 01:00 UTC). Every expected figure in reports.test.ts is worked from these rows.
 */
export interface ReportFixture {
  booth1: number;
  booth2: number;
  primer: number;
  topcoat: number;
  jobJ: number;
  jobK: number;
  coats: Record<'c1' | 'c2' | 'c3' | 'c4' | 'c5' | 'c6', number>;
}

const iso = (s: string) => new Date(s).toISOString();

async function createProduct(admin: SignedIn, body: Record<string, unknown>): Promise<number> {
  const dryingTimes = [{ tempC: 20, flashOffMin: 10, recoatMinMin: 60, recoatMaxMin: null, touchDryMin: 30, handleMin: 120, packMin: 480, fullCureH: 168 }];
  const res = await admin.agent.post('/api/products').set('x-csrf-token', admin.csrf).send({ dryingTimes, volumeSolidsPct: 40, ...body }).expect(201);
  return res.body.product.id;
}

async function createJob(admin: SignedIn, reference: string, finishSystemId: number | null): Promise<number> {
  const res = await admin.agent.post('/api/jobs').set('x-csrf-token', admin.csrf).send({ customer: 'Fixture Customer', reference, dueDate: '2025-04-30', finishSystemId }).expect(201);
  return res.body.job.id;
}

async function addPart(dataSource: DataSource, jobId: number, label: string, coatedAreaM2: number): Promise<number> {
  const now = iso('2025-03-01T00:00:00Z');
  const part = await dataSource.getRepository(PartEntity).save({
    jobId, label, kind: 'panel', lengthMm: 1000, widthMm: 500, thicknessMm: 18, quantity: 1, faces: 'both', edges: false,
    coatedAreaM2, rackId: null, shelf: null, tag: `FX${label}${jobId}`.toUpperCase().slice(0, 16), state: 'waiting', collectedAt: null, createdAt: now, updatedAt: now,
  });
  return part.id;
}

export async function addSession(dataSource: DataSource, boothId: number, start: string, end: string, extra: Partial<SpraySessionEntity> = {}): Promise<number> {
  const row = await dataSource.getRepository(SpraySessionEntity).save({
    boothId, startAt: iso(start), endAt: iso(end), sprayerId: null, state: 'done', notes: '', checklist: null, overrideReason: null,
    sprayingStartedAt: null, clearingStartedAt: null, createdAt: iso(start), updatedAt: iso(start), ...extra,
  });
  return row.id;
}

interface CoatRow {
  session: number; product: number; parts: number[]; at: string; step: number | null;
  air: number; surface: number; rh: number; dew: number; replaces?: number; reason?: string; rework?: CoatEntity['reworkReason'];
}

export async function addCoat(dataSource: DataSource, c: CoatRow): Promise<number> {
  const at = iso(c.at);
  const coat = await dataSource.getRepository(CoatEntity).save({
    spraySessionId: c.session, productId: c.product, lotId: null, stepPosition: c.step, mixId: null, sprayedAt: at,
    airTempC: c.air, relativeHumidityPct: c.rh, surfaceTempC: c.surface, dewPointC: c.dew, thinningPct: 0, wetFilmUm: null, dryFilmUm: null,
    dryingTempC: c.air, dryingMethod: 'fixture', flashOffEndsAt: at, recoatOpensAt: at, recoatClosesAt: null, touchDryAt: at, handleAt: at, packAt: at, fullCureAt: at,
    warnings: [], notes: '', reworkReason: c.rework ?? null, version: c.replaces ? 2 : 1, replacesId: c.replaces ?? null, correctionReason: c.reason ?? null,
    recordedById: null, recordedByName: 'Fixture', recordedAt: at, idempotencyKey: null,
  });
  if (c.parts.length) await dataSource.getRepository(CoatPartEntity).insert(c.parts.map((partId) => ({ coatId: coat.id, partId })));
  return coat.id;
}

async function addMix(dataSource: DataSource, session: number, productId: number, at: string, litres: [number, number, number]): Promise<void> {
  await dataSource.getRepository(MixEntity).insert({
    spraySessionId: session, productId, lotIds: [], baseL: litres[0], hardenerL: litres[1], thinnerL: litres[2], mixedAt: iso(at), tempC: 20,
    inductionEndsAt: iso(at), potLifeEndsAt: null, potLifeWarningAt: null, recordedById: null, recordedByName: 'Fixture',
  });
}

async function addReading(dataSource: DataSource, boothId: number, at: string, air: number, rh: number, surface: number | null, dew: number): Promise<void> {
  await dataSource.getRepository(ReadingEntity).insert({ boothId, rackId: null, at: iso(at), airTempC: air, relativeHumidityPct: rh, surfaceTempC: surface, dewPointC: dew, source: 'typed', recordedById: null });
}

export async function buildReportFixture(dataSource: DataSource, admin: SignedIn, finishSystemId: number): Promise<ReportFixture> {
  const booths = (await admin.agent.get('/api/booths').expect(200)).body.items as { id: number }[];
  const [booth1, booth2] = booths.map((b) => b.id);
  const primer = await createProduct(admin, { name: 'Fixture primer', kind: 'primer', chemistry: 'solvent-borne', vocGPerL: 420, minApplicationTempC: 15, maxRelativeHumidityPct: 80 });
  const topcoat = await createProduct(admin, { name: 'Fixture topcoat', kind: 'topcoat', chemistry: 'water-borne', vocGPerL: null });
  const jobJ = await createJob(admin, 'FX-J', finishSystemId);
  const jobK = await createJob(admin, 'FX-K', null);
  const [a, b, c] = [await addPart(dataSource, jobJ, 'a', 2), await addPart(dataSource, jobJ, 'b', 1.5), await addPart(dataSource, jobJ, 'c', 0.5)];
  const d = await addPart(dataSource, jobK, 'd', 1);

  // Sessions: S1 and S2 in the week of 24 March; S3 starts 00:30 BST on Monday 31 March (23:30 UTC Sunday).
  const s1 = await addSession(dataSource, booth1, '2025-03-24T08:00:00Z', '2025-03-24T12:00:00Z', { sprayingStartedAt: iso('2025-03-24T08:30:00Z'), clearingStartedAt: iso('2025-03-24T11:30:00Z') });
  const s2 = await addSession(dataSource, booth1, '2025-03-26T13:00:00Z', '2025-03-26T15:30:00Z');
  await addSession(dataSource, booth2, '2025-03-30T23:30:00Z', '2025-03-31T00:30:00Z');
  await addSession(dataSource, booth1, '2025-03-25T08:00:00Z', '2025-03-25T10:00:00Z', { state: 'cancelled' });
  await addSession(dataSource, booth2, '2025-03-23T23:30:00Z', '2025-03-24T00:30:00Z'); // Sunday 23 March: before the range

  const good = { air: 20, surface: 19, rh: 50, dew: 9.3 };
  const c1 = await addCoat(dataSource, { session: s1, product: primer, parts: [a, b], at: '2025-03-24T09:00:00Z', step: 1, ...good });
  const c2 = await addCoat(dataSource, { session: s1, product: primer, parts: [c], at: '2025-03-24T10:00:00Z', step: 1, air: 12, surface: 12, rh: 85, dew: 9.6 });
  const c3 = await addCoat(dataSource, { session: s2, product: topcoat, parts: [a], at: '2025-03-26T13:20:00Z', step: 2, ...good, surface: 20 });
  const c6 = await addCoat(dataSource, { session: s2, product: topcoat, parts: [d], at: '2025-03-26T14:00:00Z', step: null, ...good });
  const c4 = await addCoat(dataSource, { session: s2, product: topcoat, parts: [a], at: '2025-03-26T14:50:00Z', step: 2, ...good, rework: 'dust-or-debris' });
  const c5 = await addCoat(dataSource, { session: s1, product: primer, parts: [a, b], at: '2025-03-24T09:00:00Z', step: 1, ...good, replaces: c1, reason: '  Wrong LOT ' });

  await addMix(dataSource, s1, primer, '2025-01-15T09:00:00Z', [1, 0, 0]); // January: only in the running total
  await addMix(dataSource, s1, primer, '2025-03-24T08:20:00Z', [2, 0.5, 0.5]);
  await addMix(dataSource, s2, topcoat, '2025-03-26T13:05:00Z', [1, 0, 0]);
  await addMix(dataSource, s2, primer, '2025-04-02T09:00:00Z', [2, 0, 0]); // April

  await addReading(dataSource, booth1, '2025-03-24T08:10:00Z', 18, 60, null, 10.1);
  await addReading(dataSource, booth1, '2025-03-24T08:40:00Z', 20, 50, 19, 9.3);
  await addReading(dataSource, booth2, '2025-03-24T08:40:00Z', 5, 95, 5, 4.3); // the other booth: never in booth 1's report
  return { booth1, booth2, primer, topcoat, jobJ, jobK, coats: { c1, c2, c3, c4, c5, c6 } };
}
