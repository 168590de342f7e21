import { effectiveClearance, faceVelocityMps } from '../../shared/finishing/booth-air';
import { createBoothSchema, type Booth } from '../../shared/schemas/booth';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { SiteData } from '../data/site-data';
import { systemClock, type Clock } from '../lib/clock';
import { createCrudService } from './crud-service';

export function toBoothDto(booth: BoothEntity): Booth {
  const clearance = effectiveClearance({
    measuredClearanceMin: booth.measuredClearanceMin,
    volumeM3: booth.volumeM3,
    extractionM3PerH: booth.extractionM3PerH,
    mixingFactorK: booth.mixingFactorK,
  });
  return {
    id: booth.id,
    name: booth.name,
    kind: booth.kind,
    volumeM3: booth.volumeM3,
    extractionM3PerH: booth.extractionM3PerH,
    mixingFactorK: booth.mixingFactorK,
    measuredClearanceMin: booth.measuredClearanceMin,
    minFaceVelocityMps: booth.minFaceVelocityMps,
    openFaceAreaM2: booth.openFaceAreaM2,
    openingHours: booth.openingHours,
    sprayRateM2PerH: booth.sprayRateM2PerH,
    clearanceMin: Math.round(clearance.minutes * 10) / 10,
    clearanceSource: clearance.source,
    faceVelocityMps: booth.openFaceAreaM2
      ? Math.round(faceVelocityMps({ extractionM3PerH: booth.extractionM3PerH, openFaceAreaM2: booth.openFaceAreaM2 }) * 100) / 100
      : null,
    siteId: booth.siteId,
    createdAt: booth.createdAt,
    updatedAt: booth.updatedAt,
  };
}

export function createBoothService(data: SiteData, clock: Clock = systemClock) {
  return createCrudService(data, clock, {
    table: (d) => d.booths,
    noun: 'booth',
    createSchema: createBoothSchema,
    order: { name: 'ASC', id: 'ASC' },
    toDto: toBoothDto,
    siteOwned: true,
  });
}

export type BoothService = ReturnType<typeof createBoothService>;
