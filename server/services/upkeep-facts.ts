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

/** The row each group's newest is: one subquery per group, served by the (group, date) indexes. */
const newestOfGroup = (table: string, group: string, date: string) =>
  `scoped.id = (SELECT newest.id FROM ${table} newest WHERE newest.${group} = scoped.${group} ORDER BY newest.${date} DESC, newest.id DESC LIMIT 1)`;

const byKey = <T, K>(rows: T[], key: (row: T) => K) => new Map(rows.map((row) => [key(row), row]));

/** Each booth's filter banks (active ones unless asked) with their latest gauge reading and last change, in three queries for any number of booths. */
export async function banksOfBooths(data: SiteData, boothIds: number[], withInactive = false): Promise<Map<number, FilterBank[]>> {
  const result = new Map<number, FilterBank[]>(boothIds.map((id) => [id, []]));
  if (boothIds.length === 0) return result;
  const banks = await data.filterBanks.find({ where: withInactive ? { boothId: In(boothIds) } : { boothId: In(boothIds), active: true }, order: { name: 'ASC', id: 'ASC' } });
  const bankIds = banks.map((b) => b.id);
  const [readings, changes] = bankIds.length
    ? await Promise.all([
        data.gaugeReadings.select('scoped').where('scoped.filter_bank_id IN (:...bankIds)', { bankIds }).andWhere(newestOfGroup('filter_gauge_readings', 'filter_bank_id', 'at')).getMany(),
        data.filterChanges.select('scoped').where('scoped.filter_bank_id IN (:...bankIds)', { bankIds }).andWhere(newestOfGroup('filter_changes', 'filter_bank_id', 'changed_at')).getMany(),
      ])
    : [[], []];
  const latest = byKey(readings, (r) => r.filterBankId);
  const lastChange = byKey(changes, (c) => c.filterBankId);
  for (const bank of banks) result.get(bank.boothId)?.push(toFilterBankDto(bank, latest.get(bank.id) ?? null, lastChange.get(bank.id) ?? null));
  return result;
}

export async function banksOf(data: SiteData, boothId: number, withInactive = false): Promise<FilterBank[]> {
  return (await banksOfBooths(data, [boothId], withInactive)).get(boothId)!;
}

export interface LatestTests {
  extraction: ExtractionTestEntity | null;
  fire: FireInspectionEntity | null;
}

/** Each booth's latest extraction test and fire inspection (the most recent date, then the latest recorded), in two queries. */
export async function latestTestsOfBooths(data: SiteData, boothIds: number[]): Promise<Map<number, LatestTests>> {
  if (boothIds.length === 0) return new Map();
  const [tests, inspections] = await Promise.all([
    data.extractionTests.select('scoped').where('scoped.booth_id IN (:...boothIds)', { boothIds }).andWhere(newestOfGroup('extraction_tests', 'booth_id', 'tested_on')).getMany(),
    data.fireInspections.select('scoped').where('scoped.booth_id IN (:...boothIds)', { boothIds }).andWhere(newestOfGroup('fire_inspections', 'booth_id', 'inspected_on')).getMany(),
  ]);
  const extraction = byKey(tests, (t) => t.boothId);
  const fire = byKey(inspections, (f) => f.boothId);
  return new Map(boothIds.map((id) => [id, { extraction: extraction.get(id) ?? null, fire: fire.get(id) ?? null }]));
}

export async function latestTests(data: SiteData, boothId: number): Promise<LatestTests> {
  return (await latestTestsOfBooths(data, [boothId])).get(boothId)!;
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
