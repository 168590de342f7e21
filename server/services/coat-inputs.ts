import { In, type EntityManager } from 'typeorm';
import { computeCoatRecord, type CoatRecord, type CoatWarning } from '../../shared/finishing/coat-record';
import type { FinishStep } from '../../shared/finishing/readiness';
import type { CreateCoatInput } from '../../shared/schemas/coat';
import { calendarDateIn } from '../../shared/time';
import type { CoatEntity } from '../db/entities/coat.entity';
import { MixEntity } from '../db/entities/mix.entity';
import { PartEntity } from '../db/entities/part.entity';
import { ProductLotEntity } from '../db/entities/product-lot.entity';
import { ProductEntity } from '../db/entities/product.entity';
import { RackEntity } from '../db/entities/rack.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { AppError } from '../lib/app-error';
import { currentCoatsByPart, denibTimesByPart, nextCoatStep, stepsByJob } from './part-coats';

export type CoatFields = Omit<Required<CreateCoatInput>, 'idempotencyKey'>;

/** Heated racks dry faster: use the coolest heated rack when every part sits on one, else the booth air. */
async function dryingTemperature(manager: EntityManager, parts: PartEntity[], fields: CoatFields): Promise<number> {
  if (fields.dryingTempC !== null) return fields.dryingTempC;
  const rackIds = [...new Set(parts.map((p) => p.rackId))];
  if (rackIds.includes(null)) return fields.airTempC;
  const racks = await manager.findBy(RackEntity, { id: In(rackIds as number[]) });
  const heated = racks.map((r) => r.dryingTempC);
  return heated.every((t): t is number => t !== null) ? Math.min(...heated) : fields.airTempC;
}

async function loadReferences(manager: EntityManager, fields: CoatFields) {
  const [session, product, parts] = await Promise.all([
    manager.findOneBy(SpraySessionEntity, { id: fields.spraySessionId }),
    manager.findOneBy(ProductEntity, { id: fields.productId }),
    manager.findBy(PartEntity, { id: In(fields.partIds) }),
  ]);
  if (!session) throw new AppError('validation_failed', 'That spray session does not exist', { spraySessionId: 'Choose a spray session' });
  if (session.state === 'cancelled') throw new AppError('conflict', `Spray session ${session.id} was cancelled; log the coat on the session that ran`);
  if (!product) throw new AppError('validation_failed', 'That product does not exist', { productId: 'Choose a product' });
  if (parts.length !== new Set(fields.partIds).size) throw new AppError('validation_failed', 'One or more parts do not exist', { partIds: 'Choose parts that exist' });
  return { session, product, parts };
}

async function lotExpired(manager: EntityManager, fields: CoatFields, timeZone: string): Promise<boolean> {
  if (fields.lotId === null) return false;
  const lot = await manager.findOneBy(ProductLotEntity, { id: fields.lotId });
  if (!lot || lot.productId !== fields.productId) throw new AppError('validation_failed', 'That lot is not a lot of this product', { lotId: 'Choose a lot of the product sprayed' });
  return lot.expiresOn !== null && lot.expiresOn < calendarDateIn(new Date(fields.sprayedAt), timeZone);
}

/** A coat from a pot still standing, or past its pot life, is recorded with a stop to acknowledge. */
async function mixWarnings(manager: EntityManager, fields: CoatFields): Promise<CoatWarning[]> {
  if (fields.mixId === null) return [];
  const mix = await manager.findOneBy(MixEntity, { id: fields.mixId });
  if (!mix || mix.productId !== fields.productId) throw new AppError('validation_failed', 'That mix is not a mix of this product', { mixId: 'Choose a mix of the product sprayed' });
  const sprayedAt = new Date(fields.sprayedAt).toISOString();
  if (mix.potLifeEndsAt && sprayedAt > mix.potLifeEndsAt) return [{ code: 'pot-life-expired', verdict: 'stop', message: 'The pot was past its pot life when this coat went on.' }];
  if (sprayedAt < mix.inductionEndsAt) return [{ code: 'induction-not-over', verdict: 'caution', message: 'The pot had not finished its induction (stand) time.' }];
  return [];
}

/**
 * A denib between the last coat and this one gives a mechanical key: then only the opening counts.
 * It is on record when every part was denibbed since that coat; a planned abrade step counts too
 * for a coat logged without its denib record.
 */
function previousWindow(latest: CoatEntity, system: FinishStep[], stepPosition: number | null, denibbed: boolean) {
  const planned = latest.stepPosition !== null && stepPosition !== null && system.slice(latest.stepPosition + 1, stepPosition).some((s) => s.kind === 'abrade');
  const abraded = planned || denibbed;
  return { opensAt: new Date(latest.recoatOpensAt), closesAt: latest.recoatClosesAt && !abraded ? new Date(latest.recoatClosesAt) : null };
}

function denibbedSince(denibs: Map<number, Date[]>, partIds: number[], since: string, until: Date): boolean {
  const from = Date.parse(since);
  return partIds.every((id) => (denibs.get(id) ?? []).some((at) => at.getTime() > from && at.getTime() <= until.getTime()));
}

/** Works out the step, the target film, the previous window and every computed value of a coat. */
export async function prepareCoat(manager: EntityManager, fields: CoatFields, timeZone: string): Promise<{ record: CoatRecord; stepPosition: number | null; dryingTempC: number }> {
  const { product, parts } = await loadReferences(manager, fields);
  const ids = parts.map((p) => p.id);
  const [coats, steps, denibs] = await Promise.all([currentCoatsByPart(manager, ids), stepsByJob(manager, parts), denibTimesByPart(manager, ids)]);
  const first = parts[0];
  const system = steps.get(first.jobId) ?? [];
  const firstCoats = coats.get(first.id) ?? [];
  const stepPosition = fields.stepPosition ?? nextCoatStep(system, firstCoats);
  const step = stepPosition === null ? undefined : system[stepPosition];
  const sprayedAt = new Date(fields.sprayedAt);
  const earlier = [...coats.values()].flat().filter((c) => c.sprayedAt < sprayedAt.toISOString());
  const latest = earlier.sort((a, b) => b.sprayedAt.localeCompare(a.sprayedAt))[0];
  const dryingTempC = await dryingTemperature(manager, parts, fields);
  const record = computeCoatRecord({
    product,
    sprayedAt,
    airTempC: fields.airTempC,
    relativeHumidityPct: fields.relativeHumidityPct,
    surfaceTempC: fields.surfaceTempC,
    dryingTempC,
    thinningPct: fields.thinningPct,
    wetFilmUm: fields.wetFilmUm,
    targetDryFilmUm: step?.kind === 'coat' ? step.dryFilmUm : null,
    lotExpired: await lotExpired(manager, fields, timeZone),
    previousWindow: latest ? previousWindow(latest, system, stepPosition, denibbedSince(denibs, ids, latest.sprayedAt, sprayedAt)) : null,
    timeZone,
  });
  record.warnings.push(...(await mixWarnings(manager, fields)));
  if (step?.kind === 'coat' && step.productId !== fields.productId) {
    record.warnings.push({ code: 'product-not-in-step', verdict: 'caution', message: 'This product is not the one the finish system names for this step.' });
  }
  return { record, stepPosition, dryingTempC };
}
