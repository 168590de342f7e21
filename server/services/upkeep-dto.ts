import type { ExtractionTest, FilterBank, FilterChange, FireInspection, GaugeReading } from '../../shared/schemas/upkeep';
import { filterBankStatus } from '../../shared/finishing/upkeep-due';
import type { ExtractionTestEntity } from '../db/entities/extraction-test.entity';
import type { FilterBankEntity } from '../db/entities/filter-bank.entity';
import type { FilterChangeEntity } from '../db/entities/filter-change.entity';
import type { FilterGaugeReadingEntity } from '../db/entities/filter-gauge-reading.entity';
import type { FireInspectionEntity } from '../db/entities/fire-inspection.entity';

export function toGaugeReadingDto(r: FilterGaugeReadingEntity): GaugeReading {
  const { id, filterBankId, boothId, pressureDropPa, at, source, recordedByName } = r;
  return { id, filterBankId, boothId, pressureDropPa, at, source, recordedByName };
}

export function toFilterChangeDto(c: FilterChangeEntity): FilterChange {
  const { id, filterBankId, boothId, changedAt, beforePa, afterPa, notes, changedByName } = c;
  return { id, filterBankId, boothId, changedAt, beforePa, afterPa, notes, changedByName };
}

export function toExtractionTestDto(t: ExtractionTestEntity): ExtractionTest {
  const { id, boothId, testedOn, faceVelocityPointsMps, clearanceMin, testedBy, nextDueOn, notes, recordedByName, recordedAt } = t;
  const meanFaceVelocityMps = Math.round(t.meanFaceVelocityMps * 1000) / 1000;
  return { id, boothId, testedOn, faceVelocityPointsMps, meanFaceVelocityMps, meetsMinimum: t.meanFaceVelocityMps >= t.minFaceVelocityMps, clearanceMin, testedBy, nextDueOn, notes, recordedByName, recordedAt };
}

export function toFireInspectionDto(f: FireInspectionEntity): FireInspection {
  const { id, boothId, inspectedOn, inspectedBy, passed, nextDueOn, notes, recordedByName, recordedAt } = f;
  return { id, boothId, inspectedOn, inspectedBy, passed, nextDueOn, notes, recordedByName, recordedAt };
}

/** A bank with what its gauge says now, from its latest reading and its last change. */
export function toFilterBankDto(bank: FilterBankEntity, latest: FilterGaugeReadingEntity | null, lastChange: FilterChangeEntity | null): FilterBank {
  const { status, currentPa } = filterBankStatus({
    changeAtPa: bank.changeAtPa,
    latestReading: latest && { pressureDropPa: latest.pressureDropPa, at: latest.at },
    lastChange: lastChange && { changedAt: lastChange.changedAt, afterPa: lastChange.afterPa },
  });
  return {
    id: bank.id,
    boothId: bank.boothId,
    name: bank.name,
    kind: bank.kind as FilterBank['kind'],
    changeAtPa: bank.changeAtPa,
    active: bank.active,
    status,
    currentPa,
    latestReading: latest && toGaugeReadingDto(latest),
    lastChange: lastChange && toFilterChangeDto(lastChange),
  };
}
