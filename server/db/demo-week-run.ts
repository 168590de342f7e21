import type { TZDate } from '@date-fns/tz';
import { wetFilmTargetUm } from '../../shared/finishing/film';
import type { Checklist } from '../../shared/schemas/checklist';
import type { createCoatService } from '../services/coats';
import type { createMixService } from '../services/mixes';
import type { SpraySessionActor } from '../services/spray-session-progress';
import type { SpraySessionService } from '../services/spray-sessions';
import type { BoothEntity } from './entities/booth.entity';
import type { ProductEntity } from './entities/product.entity';

const minute = 60_000;

export interface RunContext {
  clock: { at: Date };
  now: Date;
  sessions: SpraySessionService;
  mixes: ReturnType<typeof createMixService>;
  coats: ReturnType<typeof createCoatService>;
  products: Map<number, ProductEntity>;
  /** Puts parts whose last coat is on onto the drying rack. */
  shelve: (partIds: number[], actor: SpraySessionActor) => Promise<void>;
}

export interface WeekSession {
  id: number;
  booth: BoothEntity;
  start: TZDate;
  end: TZDate;
  partIds: number[];
  step: { position: number; productId: number; dryFilmUm: number };
  /** The job's last coat: once on, the parts go to the drying rack. */
  lastCoat: boolean;
  sprayer: SpraySessionActor;
}

// A mild, dry day in the booth: well inside every demo product's limits, surface above the dew point.
const conditions = { airTempC: 19, relativeHumidityPct: 55, surfaceTempC: 18 };

/** The checks as the sprayer ticks them: an air-fed hood for isocyanate products, a vapour mask otherwise. */
function checklistFor(booth: BoothEntity, product: ProductEntity): Checklist {
  const isocyanate = product.hazards.includes('isocyanate');
  return {
    extractionRunning: true, filtersChecked: true, respiratorFitted: true, overrideReason: null,
    faceVelocityMps: Math.round(((booth.minFaceVelocityMps ?? 0.4) + 0.05) * 100) / 100,
    respiratorKind: isocyanate ? 'air-fed' : 'vapour-and-particulate',
    ...conditions,
  };
}

/** Enough for the parts through the gun, rounded up to a half litre as a sprayer mixes. */
function litresFor(session: WeekSession, product: ProductEntity): number {
  const areaM2 = session.partIds.length * 0.8;
  const litres = (areaM2 * session.step.dryFilmUm) / (10 * product.volumeSolidsPct * 0.65);
  return Math.max(0.5, Math.ceil(litres * 2) / 2);
}

/**
 * Runs a session as far as `now` allows, at the times it would have happened: the checks ten
 * minutes in, spraying from a quarter past, a pot, then the coat half an hour in (after a job's last
 * coat its parts go onto the drying rack); a session already over is cleared and done. A session still to come is left planned.
 */
export async function runSessionSoFar(run: RunContext, session: WeekSession): Promise<void> {
  const at = (minutes: number) => new Date(session.start.getTime() + minutes * minute);
  if (at(15).getTime() > run.now.getTime()) return;
  const product = run.products.get(session.step.productId)!;
  run.clock.at = at(10);
  await run.sessions.update(session.id, { checklist: checklistFor(session.booth, product) }, session.sprayer);
  run.clock.at = at(15);
  await run.sessions.update(session.id, { state: 'spraying' }, session.sprayer);
  run.clock.at = at(20);
  const { result: mix } = await run.mixes.create(session.id, { productId: product.id, wantedL: litresFor(session, product), thinningPct: product.thinnerMinPct, tempC: conditions.airTempC }, session.sprayer);
  if (at(30).getTime() > run.now.getTime()) return;
  run.clock.at = at(35);
  const wetFilmUm = Math.round(wetFilmTargetUm({ volumeSolidsPct: product.volumeSolidsPct, thinningPct: product.thinnerMinPct, dryFilmUm: session.step.dryFilmUm }) / 5) * 5;
  await run.coats.create({ spraySessionId: session.id, partIds: session.partIds, productId: product.id, sprayedAt: at(30).toISOString(), ...conditions, thinningPct: product.thinnerMinPct, wetFilmUm, mixId: mix.id, stepPosition: session.step.position }, session.sprayer);
  run.clock.at = at(40);
  if (session.lastCoat) await run.shelve(session.partIds, session.sprayer);
  if (session.end.getTime() > run.now.getTime()) return;
  run.clock.at = new Date(session.end.getTime() - 30 * minute);
  await run.sessions.update(session.id, { state: 'clearing' }, session.sprayer);
  run.clock.at = new Date(session.end.getTime());
  await run.sessions.update(session.id, { state: 'done' }, session.sprayer);
}
