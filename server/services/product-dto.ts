import type { FileRef, Lot, Product } from '../../shared/schemas/product';
import type { ProductLotEntity } from '../db/entities/product-lot.entity';
import type { ProductEntity } from '../db/entities/product.entity';

export function toLotDto(lot: ProductLotEntity, today: string): Lot {
  return {
    id: lot.id,
    productId: lot.productId,
    lotNumber: lot.lotNumber,
    expiresOn: lot.expiresOn,
    expired: lot.expiresOn !== null && lot.expiresOn < today,
    createdAt: lot.createdAt,
  };
}

export function toProductDto(p: ProductEntity, lots: ProductLotEntity[], files: Map<number, FileRef>, today: string): Product {
  return {
    id: p.id,
    name: p.name,
    makerRef: p.makerRef,
    kind: p.kind,
    chemistry: p.chemistry,
    volumeSolidsPct: p.volumeSolidsPct,
    densityKgPerL: p.densityKgPerL,
    mixBaseParts: p.mixBaseParts,
    mixHardenerParts: p.mixHardenerParts,
    thinnerMinPct: p.thinnerMinPct,
    thinnerMaxPct: p.thinnerMaxPct,
    thinningRangeGiven: p.thinningRangeGiven,
    inductionMin: p.inductionMin,
    potLifeMin: p.potLifeMin,
    dryFilmPerCoatUm: p.dryFilmPerCoatUm,
    referenceRhPct: p.referenceRhPct,
    minApplicationTempC: p.minApplicationTempC,
    maxRelativeHumidityPct: p.maxRelativeHumidityPct,
    vocGPerL: p.vocGPerL,
    flashPointC: p.flashPointC,
    hazards: p.hazards,
    pricePerL: p.pricePerL,
    dryingTimes: p.dryingTimes,
    lots: lots.map((lot) => toLotDto(lot, today)),
    tdsFile: p.tdsFileId === null ? null : (files.get(p.tdsFileId) ?? null),
    sdsFile: p.sdsFileId === null ? null : (files.get(p.sdsFileId) ?? null),
    createdAt: p.createdAt,
    updatedAt: p.updatedAt,
  };
}
