import { TZDate } from '@date-fns/tz';
import { openSiteData } from '../data/site-data';
import { everySite } from '../lib/site-scope';
import { addDays, startOfWeek } from 'date-fns';
import type { DataSource } from 'typeorm';
import { dewPointC } from '../../shared/finishing/conditions';
import { wetFilmTargetUm } from '../../shared/finishing/film';
import { litresNeeded } from '../../shared/finishing/material';
import type { CreatePartInput } from '../../shared/schemas/part';
import { systemActor, type Actor } from '../services/audit';
import { createCoatService } from '../services/coats';
import { EventBus } from '../services/events';
import { createJobService } from '../services/jobs';
import { createPartService } from '../services/parts';
import { createSettingsService } from '../services/settings';
import { BoothEntity } from './entities/booth.entity';
import { FinishStepEntity } from './entities/finish-step.entity';
import { FinishSystemEntity } from './entities/finish-system.entity';
import { MixEntity } from './entities/mix.entity';
import { PartEntity } from './entities/part.entity';
import { ProductEntity } from './entities/product.entity';
import { ReadingEntity } from './entities/reading.entity';
import { SpraySessionEntity } from './entities/spray-session.entity';
import { UserEntity } from './entities/user.entity';

/** Finished jobs of the last few weeks, so the coat log and reports have something to show. */
const pastJobs: { customer: string; reference: string; system: string; parts: CreatePartInput[] }[] = [
  { customer: 'Brightwater Homes', reference: 'LJ-26-091', system: 'Painted MDF, 2K PU satin', parts: doors('Door', 10, 715, 496) },
  { customer: 'Hollins Yard Kitchens', reference: 'LJ-26-092', system: 'Water-borne painted', parts: doors('Door', 8, 895, 446) },
  { customer: 'Corran Library Trust', reference: 'LJ-26-093', system: 'Clear oak, precat matt', parts: doors('Shelf', 12, 900, 280) },
  { customer: 'Tamsin Vale Design', reference: 'LJ-26-094', system: 'Painted MDF, 2K PU satin', parts: doors('Door', 6, 1245, 596) },
  { customer: 'Orchard Row Dental', reference: 'LJ-26-095', system: 'Water-borne painted', parts: doors('Panel', 9, 1100, 560) },
  { customer: 'Fenwick & Pryor', reference: 'LJ-26-096', system: 'Clear oak, precat matt', parts: doors('Drawer front', 14, 520, 180) },
  { customer: 'Kelda Lane Flats', reference: 'LJ-26-097', system: 'Water-borne painted', parts: doors('Door', 16, 715, 396) },
  { customer: 'Ashby Marsh Pub Co.', reference: 'LJ-26-098', system: 'Painted MDF, 2K PU satin', parts: doors('Panel', 8, 1800, 400) },
  { customer: 'Wren & Tallis', reference: 'LJ-26-099', system: 'Clear oak, precat matt', parts: doors('Door', 10, 570, 446) },
];

function doors(label: string, count: number, lengthMm: number, widthMm: number): CreatePartInput[] {
  return Array.from({ length: count }, (_, i) => ({ label: `${label} ${i + 1}`, kind: 'door', lengthMm, widthMm, thicknessMm: 18, quantity: 1, faces: 'both', edges: true }));
}

/** A fixed sequence of "random" numbers, so every demo shop has the same history. */
function sequence(seed: number) {
  let state = seed;
  return () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648;
  };
}

interface PendingStep {
  position: number;
  productId: number;
  dryFilmUm: number;
  partIds: number[];
  areaM2: number;
}

interface HistoryContext {
  dataSource: DataSource;
  timeZone: string;
  sprayer: Actor;
  booths: BoothEntity[];
  products: Map<number, ProductEntity>;
  clock: { at: Date; now(): Date };
  random: () => number;
}

async function createPastJobs(dataSource: DataSource, weeksBack: Date): Promise<{ steps: PendingStep[][]; partIds: number[] }> {
  const jobs = createJobService(openSiteData(dataSource, everySite));
  const parts = createPartService(openSiteData(dataSource, everySite));
  const systems = new Map((await dataSource.getRepository(FinishSystemEntity).find()).map((s) => [s.name, s.id]));
  const steps: PendingStep[][] = [];
  const allParts: number[] = [];
  for (const [index, spec] of pastJobs.entries()) {
    const systemId = systems.get(spec.system);
    if (!systemId) continue;
    const job = await jobs.create({ customer: spec.customer, reference: spec.reference, dueDate: addDays(weeksBack, 7 * (index + 2)).toISOString().slice(0, 10), finishSystemId: systemId, colour: '', sheen: '', notes: 'Finished and delivered (demo history).' }, systemActor);
    const created = await parts.createMany(job.id, spec.parts, systemActor);
    const partIds = created.map((p) => p.id);
    const areaM2 = created.reduce((sum, p) => sum + p.coatedAreaM2, 0);
    allParts.push(...partIds);
    const coatSteps = await dataSource.getRepository(FinishStepEntity).find({ where: { finishSystemId: systemId, kind: 'coat' }, order: { position: 'ASC' } });
    steps.push(coatSteps.map((s) => ({ position: s.position, productId: s.productId!, dryFilmUm: s.dryFilmUm!, partIds, areaM2 })));
  }
  return { steps, partIds: allParts };
}

async function bookSpraySession(ctx: HistoryContext, booth: BoothEntity, day: TZDate): Promise<SpraySessionEntity> {
  const at = (hour: number, minute = 0) => new TZDate(day.getFullYear(), day.getMonth(), day.getDate(), hour, minute, ctx.timeZone).toISOString();
  const iso = (s: string) => new Date(s).toISOString();
  return ctx.dataSource.getRepository(SpraySessionEntity).save({
    boothId: booth.id, startAt: iso(at(8)), endAt: iso(at(11, 30)), sprayerId: ctx.sprayer.id, state: 'done', notes: '', checklist: null, overrideReason: null,
    sprayingStartedAt: iso(at(8, 20)), clearingStartedAt: iso(at(11, 0)), createdAt: iso(at(7)), updatedAt: iso(at(11, 30)),
  });
}

async function mixFor(ctx: HistoryContext, spraySession: SpraySessionEntity, step: PendingStep, at: Date): Promise<number> {
  const product = ctx.products.get(step.productId)!;
  // What the step needs through an HVLP gun (65 % transfer), plus the 5–30 % a real pot leaves over.
  const needed = litresNeeded({ areaM2: step.areaM2, coats: 1, dryFilmUm: step.dryFilmUm, volumeSolidsPct: product.volumeSolidsPct, transferEfficiencyPct: 65 });
  const mixed = Math.round(needed * (1.05 + ctx.random() * 0.25) * 100) / 100;
  const parts = product.mixBaseParts + product.mixHardenerParts;
  const base = (mixed * product.mixBaseParts) / parts;
  const hardener = mixed - base;
  const thinner = (mixed * product.thinnerMinPct) / 100;
  const iso = at.toISOString();
  const mix = await ctx.dataSource.getRepository(MixEntity).save({
    spraySessionId: spraySession.id, productId: step.productId, lotIds: [], baseL: base, hardenerL: hardener, thinnerL: thinner, mixedAt: iso, tempC: 19,
    inductionEndsAt: iso, potLifeEndsAt: null, potLifeWarningAt: null, recordedById: ctx.sprayer.id, recordedByName: ctx.sprayer.name,
  });
  return mix.id;
}

/** Conditions through the session's morning; week 3 is the cold, damp one the reports should show. */
function conditionsAt(ctx: HistoryContext, week: number) {
  const cold = week === 3;
  const airTempC = Math.round((cold ? 12.5 : 16.5 + ctx.random() * 3.5) * 10) / 10;
  const relativeHumidityPct = Math.round(cold ? 82 : 45 + ctx.random() * 20);
  return { airTempC, relativeHumidityPct, surfaceTempC: Math.round((airTempC - 0.8) * 10) / 10 };
}

/** The sprayer's gauge reading: near the wet film the step's dry film needs, as in a careful shop. */
function wetFilmFor(ctx: HistoryContext, step: PendingStep): { thinningPct: number; wetFilmUm: number } {
  const product = ctx.products.get(step.productId)!;
  const target = wetFilmTargetUm({ volumeSolidsPct: product.volumeSolidsPct, thinningPct: product.thinnerMinPct, dryFilmUm: step.dryFilmUm });
  return { thinningPct: product.thinnerMinPct, wetFilmUm: Math.round((target * (0.95 + ctx.random() * 0.15)) / 5) * 5 };
}

async function sprayStep(ctx: HistoryContext, spraySession: SpraySessionEntity, step: PendingStep, at: Date, week: number, coats: ReturnType<typeof createCoatService>) {
  const mixId = await mixFor(ctx, spraySession, step, new Date(at.getTime() - 10 * 60_000));
  ctx.clock.at = new Date(at.getTime() + 5 * 60_000);
  const conditions = conditionsAt(ctx, week);
  const { coat } = await coats.create({ spraySessionId: spraySession.id, partIds: step.partIds, productId: step.productId, sprayedAt: at.toISOString(), ...conditions, ...wetFilmFor(ctx, step), mixId, stepPosition: step.position }, ctx.sprayer);
  return coat;
}

async function addReadings(ctx: HistoryContext, booth: BoothEntity, day: TZDate, week: number): Promise<void> {
  const rows = Array.from({ length: 20 }, (_, i) => {
    const at = new TZDate(day.getFullYear(), day.getMonth(), day.getDate(), 7, 30 * i, ctx.timeZone);
    const { airTempC, relativeHumidityPct, surfaceTempC } = conditionsAt(ctx, week);
    return { boothId: booth.id, rackId: null, at: new Date(at.getTime()).toISOString(), airTempC, relativeHumidityPct, surfaceTempC, dewPointC: dewPointC(airTempC, relativeHumidityPct), source: 'sensor' as const, recordedById: null };
  });
  await ctx.dataSource.getRepository(ReadingEntity).insert(rows);
}

async function respray(ctx: HistoryContext, coats: ReturnType<typeof createCoatService>, spraySession: SpraySessionEntity, step: PendingStep, at: Date, week: number) {
  const sprayedAt = new Date(at.getTime() + 60 * 60_000);
  ctx.clock.at = new Date(sprayedAt.getTime() + 5 * 60_000);
  const input = { spraySessionId: spraySession.id, partIds: step.partIds.slice(0, 2), productId: step.productId, sprayedAt: sprayedAt.toISOString(), ...conditionsAt(ctx, week), ...wetFilmFor(ctx, step), stepPosition: step.position };
  await coats.create({ ...input, reworkReason: 'dust-or-debris', notes: 'Two parts re-sprayed: dust in the film.' }, ctx.sprayer);
}

/**
 * Eight weeks of finished work before this week: a spray session on Mondays, Wednesdays and Fridays,
 * pots mixed, coats logged through the coat service (so every time and warning is computed as
 * in the booth), sensor readings, a correction and two re-sprays. Parts end collected.
 */
export async function seedDemoHistory(dataSource: DataSource, options: { now?: Date; weeks?: number } = {}): Promise<void> {
  const settings = createSettingsService(openSiteData(dataSource, everySite));
  const { timezone } = await settings.get();
  const weeks = options.weeks ?? 8;
  const thisMonday = startOfWeek(new TZDate((options.now ?? new Date()).getTime(), timezone), { weekStartsOn: 1 });
  const firstMonday = addDays(thisMonday, -7 * weeks);
  const sprayerRow = await dataSource.getRepository(UserEntity).findOneBy({ role: 'sprayer' });
  const clock = { at: new Date(), now() { return this.at; } };
  const ctx: HistoryContext = {
    dataSource, timeZone: timezone, clock, random: sequence(2026),
    sprayer: sprayerRow ? { id: sprayerRow.id, name: sprayerRow.name } : systemActor,
    booths: await dataSource.getRepository(BoothEntity).find({ order: { id: 'ASC' } }),
    products: new Map((await dataSource.getRepository(ProductEntity).find()).map((p) => [p.id, p])),
  };
  if (ctx.booths.length === 0) return;
  const coats = createCoatService(openSiteData(dataSource, everySite), settings, new EventBus(), clock);
  const { steps, partIds } = await createPastJobs(dataSource, firstMonday);
  // Each job goes through in consecutive sessions, as a shop runs a batch, one step a spray session.
  const queue = steps.flat();
  let spraySessionCount = 0;
  for (let week = 0; week < weeks && queue.length > 0; week++) {
    for (const weekday of [0, 2, 4]) {
      const step = queue.shift();
      if (!step) break;
      const booth = ctx.booths[spraySessionCount++ % ctx.booths.length];
      const day = addDays(firstMonday, week * 7 + weekday);
      const spraySession = await bookSpraySession(ctx, booth, day);
      await addReadings(ctx, booth, day, week);
      const at = new Date(Date.parse(spraySession.sprayingStartedAt!) + 30 * 60_000);
      const coat = await sprayStep(ctx, spraySession, step, at, week, coats);
      if (spraySessionCount === 4) await coats.correct(coat.id, { wetFilmUm: (coat.wetFilmUm ?? 100) + 10, reason: 'Wet film typed wrong' }, ctx.sprayer);
      if (spraySessionCount === 7 || spraySessionCount === 16) await respray(ctx, coats, spraySession, step, at, week);
    }
  }
  const collectedAt = thisMonday.toISOString();
  await dataSource.getRepository(PartEntity).createQueryBuilder().update().set({ state: 'collected', collectedAt: new Date(collectedAt).toISOString() }).whereInIds(partIds).execute();
}
