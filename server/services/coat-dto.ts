import { In } from 'typeorm';
import type { Coat } from '../../shared/schemas/coat';
import type { SiteData } from '../data/site-data';
import type { CoatEntity } from '../db/entities/coat.entity';
import { coatPlacesOf } from './coat-places';

/** Coat DTOs for a page of coat rows: parts, product names, successors, and jobs with their finish systems, a few queries per page. */
export async function toCoatDtos(data: SiteData, coats: CoatEntity[]): Promise<Coat[]> {
  const ids = coats.map((c) => c.id);
  if (ids.length === 0) return [];
  const [links, products, successors] = await Promise.all([
    data.coatParts.find({ where: { coatId: In(ids) } }),
    data.products.find({ where: { id: In([...new Set(coats.map((c) => c.productId))]) }, select: { id: true, name: true } }),
    data.coats.find({ where: { replacesId: In(ids) }, select: { id: true, replacesId: true } }),
  ]);
  const places = await coatPlacesOf(data, coats, links);
  const productName = new Map(products.map((p) => [p.id, p.name]));
  const successor = new Map(successors.map((s) => [s.replacesId!, s.id]));
  return coats.map((c) => ({
    id: c.id,
    spraySessionId: c.spraySessionId,
    partIds: links.filter((l) => l.coatId === c.id).map((l) => l.partId).sort((a, b) => a - b),
    productId: c.productId,
    productName: productName.get(c.productId) ?? '',
    lotId: c.lotId,
    mixId: c.mixId,
    stepPosition: c.stepPosition,
    ...places.get(c.id)!,
    sprayedAt: c.sprayedAt,
    airTempC: c.airTempC,
    relativeHumidityPct: c.relativeHumidityPct,
    surfaceTempC: c.surfaceTempC,
    dewPointC: Math.round(c.dewPointC * 100) / 100,
    thinningPct: c.thinningPct,
    wetFilmUm: c.wetFilmUm,
    dryFilmUm: c.dryFilmUm === null ? null : Math.round(c.dryFilmUm * 10) / 10,
    dryingTempC: c.dryingTempC,
    dryingMethod: c.dryingMethod,
    flashOffEndsAt: c.flashOffEndsAt,
    recoatOpensAt: c.recoatOpensAt,
    recoatClosesAt: c.recoatClosesAt,
    touchDryAt: c.touchDryAt,
    handleAt: c.handleAt,
    packAt: c.packAt,
    fullCureAt: c.fullCureAt,
    warnings: c.warnings.map((w) => ({ code: w.code, message: w.message, acknowledgedReason: w.acknowledgedReason ?? null })),
    notes: c.notes,
    reworkReason: c.reworkReason,
    version: c.version,
    replacesId: c.replacesId,
    supersededById: successor.get(c.id) ?? null,
    correctionReason: c.correctionReason,
    recordedById: c.recordedById,
    recordedByName: c.recordedByName,
    recordedAt: c.recordedAt,
  }));
}
