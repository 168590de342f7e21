import { In } from 'typeorm';
import { computeCoatRecord, type CoatRecord, type CoatWarning } from '../../shared/finishing/coat-record';
import { coatDryingTempC } from '../../shared/finishing/drying-temperature';
import { potWarnings } from '../../shared/finishing/pot-life';
import type { FinishStep } from '../../shared/finishing/readiness';
import type { CreateCoatInput } from '../../shared/schemas/coat';
import { calendarDateIn } from '../../shared/time';
import type { SiteData } from '../data/site-data';
import type { PartEntity } from '../db/entities/part.entity';
import { AppError } from '../lib/app-error';
import { currentCoatsByPart, denibTimesByPart, nextCoatStep, stepsByJob, type CoatTimes } from './part-coats';
import { partsSeenBy } from './part-sites';

export type CoatFields = Omit<Required<CreateCoatInput>, 'idempotencyKey'>;

/** Heated racks dry faster: the shared rule picks the drying temperature from the parts' racks and the booth air. */
async function dryingTemperature(tx: SiteData, parts: PartEntity[], fields: CoatFields): Promise<number> {
  if (fields.dryingTempC !== null) return fields.dryingTempC;
  const rackIds = [...new Set(parts.flatMap((p) => (p.rackId === null ? [] : [p.rackId])))];
  const racks = rackIds.length ? await tx.racks.findBy({ id: In(rackIds) }) : [];
  const tempOf = new Map(racks.map((r) => [r.id, r.dryingTempC]));
  return coatDryingTempC(parts.map((p) => (p.rackId === null ? null : (tempOf.get(p.rackId) ?? null))), fields.airTempC);
}

/** The spray session must be one of the scope's; a part on another site's rack is not its booth's to coat. */
async function loadReferences(tx: SiteData, fields: CoatFields) {
  const [spraySession, product, parts] = await Promise.all([
    tx.spraySessions.findOneBy({ id: fields.spraySessionId }),
    tx.products.findOneBy({ id: fields.productId }),
    tx.parts.findBy({ id: In(fields.partIds) }),
  ]);
  if (!spraySession) throw new AppError('validation_failed', 'That spray session does not exist', { spraySessionId: 'Choose a spray session' });
  if (spraySession.state === 'cancelled') throw new AppError('conflict', 'This spray session was cancelled; log the coat on the session that ran');
  if (!product) throw new AppError('validation_failed', 'That product does not exist', { productId: 'Choose a product' });
  if (parts.length !== new Set(fields.partIds).size) throw new AppError('validation_failed', 'One or more parts do not exist', { partIds: 'Choose parts that exist' });
  const booth = await tx.booths.findOneBy({ id: spraySession.boothId });
  const placed = parts.filter((p) => p.rackId !== null);
  if (booth && (await partsSeenBy(tx.forSite(booth.siteId), placed)).size !== placed.length) {
    throw new AppError('validation_failed', 'One or more parts stand on a rack of another site', { partIds: 'Choose parts at this site' });
  }
  return { spraySession, product, parts, siteId: booth?.siteId ?? null };
}

async function lotExpired(tx: SiteData, fields: CoatFields, timeZone: string): Promise<boolean> {
  if (fields.lotId === null) return false;
  const lot = await tx.lots.findOneBy({ id: fields.lotId });
  if (!lot || lot.productId !== fields.productId) throw new AppError('validation_failed', 'That lot is not a lot of this product', { lotId: 'Choose a lot of the product sprayed' });
  return lot.expiresOn !== null && lot.expiresOn < calendarDateIn(new Date(fields.sprayedAt), timeZone);
}

/** A coat from a pot still standing, or past its pot life, is recorded with a stop to acknowledge. */
async function mixWarnings(tx: SiteData, fields: CoatFields): Promise<CoatWarning[]> {
  if (fields.mixId === null) return [];
  const mix = await tx.mixes.findOneBy({ id: fields.mixId });
  if (!mix || mix.productId !== fields.productId) throw new AppError('validation_failed', 'That mix is not a mix of this product', { mixId: 'Choose a mix of the product sprayed' });
  return potWarnings(mix, new Date(fields.sprayedAt));
}

/**
 * A denib between the last coat and this one gives a mechanical key: then only the opening counts.
 * It is on record when every part was denibbed since that coat; a planned abrade step counts too
 * for a coat logged without its denib record.
 */
function previousWindow(latest: CoatTimes, system: FinishStep[], stepPosition: number | null, denibbed: boolean) {
  const planned = latest.stepPosition !== null && stepPosition !== null && system.slice(latest.stepPosition + 1, stepPosition).some((s) => s.kind === 'abrade');
  const abraded = planned || denibbed;
  return { opensAt: new Date(latest.recoatOpensAt), closesAt: latest.recoatClosesAt && !abraded ? new Date(latest.recoatClosesAt) : null };
}

function denibbedSince(denibs: Map<number, Date[]>, partIds: number[], since: string, until: Date): boolean {
  const from = Date.parse(since);
  return partIds.every((id) => (denibs.get(id) ?? []).some((at) => at.getTime() > from && at.getTime() <= until.getTime()));
}

/**
 * Works out the step, the target film, the previous window and every computed value of a coat.
 * The step, the previous window and the denibs since come from the parts' whole history, whichever site did them.
 */
export async function prepareCoat(tx: SiteData, fields: CoatFields, timeZone: string): Promise<{ record: CoatRecord; stepPosition: number | null; dryingTempC: number; siteId: number | null }> {
  const { product, parts, siteId } = await loadReferences(tx, fields);
  const ids = parts.map((p) => p.id);
  const [coats, steps, denibs] = await Promise.all([currentCoatsByPart(tx.acrossSites, ids), stepsByJob(tx, parts), denibTimesByPart(tx.acrossSites, ids)]);
  const first = parts[0];
  const system = steps.get(first.jobId) ?? [];
  const firstCoats = coats.get(first.id) ?? [];
  const stepPosition = fields.stepPosition ?? nextCoatStep(system, firstCoats);
  const step = stepPosition === null ? undefined : system[stepPosition];
  const sprayedAt = new Date(fields.sprayedAt);
  const earlier = [...coats.values()].flat().filter((c) => c.sprayedAt < sprayedAt.toISOString());
  const latest = earlier.sort((a, b) => b.sprayedAt.localeCompare(a.sprayedAt))[0];
  const dryingTempC = await dryingTemperature(tx, parts, fields);
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
    lotExpired: await lotExpired(tx, fields, timeZone),
    previousWindow: latest ? previousWindow(latest, system, stepPosition, denibbedSince(denibs, ids, latest.sprayedAt, sprayedAt)) : null,
    timeZone,
  });
  record.warnings.push(...(await mixWarnings(tx, fields)));
  if (step?.kind === 'coat' && step.productId !== fields.productId) {
    record.warnings.push({ code: 'product-not-in-step', verdict: 'caution', message: 'This product is not the one the finish system names for this step.' });
  }
  return { record, stepPosition, dryingTempC, siteId };
}
