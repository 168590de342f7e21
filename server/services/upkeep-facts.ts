import { In } from 'typeorm';
import type { BoothUpkeepFacts, SprayerFacts } from '../../shared/finishing/fitness';
import type { CrewRecordKind } from '../../shared/schemas/crew';
import type { ShopSettings } from '../../shared/schemas/settings';
import type { FilterBank } from '../../shared/schemas/upkeep';
import { calendarDateIn } from '../../shared/time';
import type { SiteData } from '../data/site-data';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { CrewRecordEntity } from '../db/entities/crew-record.entity';
import type { ExtractionTestEntity } from '../db/entities/extraction-test.entity';
import type { FireInspectionEntity } from '../db/entities/fire-inspection.entity';
import { toFilterBankDto } from './upkeep-dto';

/** The shop's calendar date of an instant: upkeep and crew records fall due on shop days. */
export const shopDay = (instant: Date, settings: Pick<ShopSettings, 'timezone'>) => calendarDateIn(instant, settings.timezone);

/** Each active filter bank of a booth with its latest gauge reading and its last change. */
export async function banksOf(data: SiteData, boothId: number, withInactive = false): Promise<FilterBank[]> {
  const banks = await data.filterBanks.find({ where: withInactive ? { boothId } : { boothId, active: true }, order: { name: 'ASC', id: 'ASC' } });
  return Promise.all(
    banks.map(async (bank) => {
      const latest = await data.gaugeReadings.findOne({ where: { filterBankId: bank.id }, order: { at: 'DESC', id: 'DESC' } });
      const lastChange = await data.filterChanges.findOne({ where: { filterBankId: bank.id }, order: { changedAt: 'DESC', id: 'DESC' } });
      return toFilterBankDto(bank, latest, lastChange);
    }),
  );
}

/** The booth's latest extraction test and fire inspection: the most recent date, then the latest recorded. */
export async function latestTests(data: SiteData, boothId: number): Promise<{ extraction: ExtractionTestEntity | null; fire: FireInspectionEntity | null }> {
  const extraction = await data.extractionTests.findOne({ where: { boothId }, order: { testedOn: 'DESC', id: 'DESC' } });
  const fire = await data.fireInspections.findOne({ where: { boothId }, order: { inspectedOn: 'DESC', id: 'DESC' } });
  return { extraction, fire };
}

/** What fit to spray needs to know of a booth. */
export async function boothFacts(data: SiteData, booth: BoothEntity): Promise<BoothUpkeepFacts> {
  const [banks, { extraction, fire }] = await Promise.all([banksOf(data, booth.id), latestTests(data, booth.id)]);
  return {
    banks: banks.map(({ name, status, currentPa, changeAtPa }) => ({ name, status, currentPa, changeAtPa })),
    extractionTest: extraction && { nextDueOn: extraction.nextDueOn, passed: true, meanFaceVelocityMps: extraction.meanFaceVelocityMps, minFaceVelocityMps: extraction.minFaceVelocityMps },
    fireInspection: fire && { nextDueOn: fire.nextDueOn, passed: fire.passed },
  };
}

/** Each person's latest record of each kind, and of each training by what it was. */
export interface LatestCrewRecords {
  fitTest: CrewRecordEntity | null;
  surveillance: CrewRecordEntity | null;
  trainings: CrewRecordEntity[];
}

const newestFirst = (a: CrewRecordEntity, b: CrewRecordEntity) => b.doneOn.localeCompare(a.doneOn) || b.id - a.id;

export function latestCrewRecords(records: CrewRecordEntity[]): LatestCrewRecords {
  const sorted = [...records].sort(newestFirst);
  const first = (kind: CrewRecordKind) => sorted.find((r) => r.kind === kind) ?? null;
  const trainings = new Map<string, CrewRecordEntity>();
  for (const r of sorted) if (r.kind === 'training' && !trainings.has((r.title ?? '').toLowerCase())) trainings.set((r.title ?? '').toLowerCase(), r);
  return { fitTest: first('fit-test'), surveillance: first('health-surveillance'), trainings: [...trainings.values()] };
}

/** The latest records of several people at once, read through the scope (a person of another site has none). */
export async function crewRecordsOf(data: SiteData, userIds: number[]): Promise<Map<number, LatestCrewRecords>> {
  const rows = userIds.length ? await data.crewRecords.findBy({ userId: In(userIds) }) : [];
  return new Map(userIds.map((id) => [id, latestCrewRecords(rows.filter((r) => r.userId === id))]));
}

export function sprayerFacts(latest: LatestCrewRecords): SprayerFacts {
  const dated = (r: CrewRecordEntity | null) => r && { nextDueOn: r.nextDueOn, passed: r.result !== 'fail' };
  return { fitTest: dated(latest.fitTest), surveillance: dated(latest.surveillance), trainings: latest.trainings.map((t) => ({ title: t.title ?? 'Training', nextDueOn: t.nextDueOn })) };
}
