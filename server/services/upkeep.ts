import { dueStatus, meanFaceVelocityMps, nextDueDate } from '../../shared/finishing/upkeep-due';
import {
  createExtractionTestSchema,
  createFilterBankSchema,
  createFilterChangeSchema,
  createFireInspectionSchema,
  createGaugeReadingSchema,
  type BoothUpkeep,
  type CreateExtractionTestInput,
  type CreateFilterBankInput,
  type CreateFilterChangeInput,
  type CreateFireInspectionInput,
  type CreateGaugeReadingInput,
  type ExtractionTest,
  type FilterBank,
  type FilterChange,
  type FireInspection,
  type GaugeReading,
  type UpdateFilterBankInput,
} from '../../shared/schemas/upkeep';
import type { SiteData } from '../data/site-data';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { assertHappenedNearNow } from '../lib/instant-window';
import { changedFields, recordAudit, type Actor } from './audit';
import type { SettingsService } from './settings';
import { toExtractionTestDto, toFilterChangeDto, toFireInspectionDto, toGaugeReadingDto } from './upkeep-dto';
import { banksOf, latestTests, shopDay } from './upkeep-facts';

/** Who wrote a record: a signed-in person, or a booth's sensor posting with its token. */
export type RecordSource = { actor: Actor; sensorBoothId?: undefined } | { actor: null; sensorBoothId: number };

const recentCount = 20;
// A clock a few minutes fast on a tablet or sensor is not a record from the future.
const futureSlackMs = 15 * 60_000;

/**
 * Booth upkeep: filter banks, gauge readings, filter changes, extraction tests and fire-protection
 * inspections. A booth's upkeep is its site's; the records are append-only evidence.
 */
export function createUpkeepService(data: SiteData, settings: SettingsService, clock: Clock = systemClock) {
  async function boothOrField(boothId: number) {
    const booth = await data.booths.findOneBy({ id: boothId });
    if (!booth) throw new AppError('validation_failed', 'No such booth', { boothId: 'Choose a booth' });
    return booth;
  }

  async function bankOrField(filterBankId: number) {
    const bank = await data.filterBanks.findOneBy({ id: filterBankId });
    if (!bank) throw new AppError('validation_failed', 'No such filter bank', { filterBankId: 'Choose a filter bank of this booth' });
    return bank;
  }

  /** An instant given or now; never more than a few minutes ahead of the server's clock, nor further back than a record is typed in. */
  function instantOrNow(given: string | undefined, field: string): string {
    const now = clock.now();
    const at = given ? new Date(given) : now;
    if (at.getTime() > now.getTime() + futureSlackMs) throw new AppError('validation_failed', 'That time is in the future', { [field]: 'Not later than now' });
    assertHappenedNearNow(given, field, now);
    return at.toISOString();
  }

  async function notAfterToday(date: string, field: string): Promise<void> {
    const today = shopDay(clock.now(), await settings.get());
    if (date > today) throw new AppError('validation_failed', 'That date has not come yet', { [field]: `Today (${today}) at the latest` });
  }

  /** The next-due date from the record's date and the shop's interval, or the date given; a bad date names its field. */
  function dueDate(doneOn: string, months: number | null, given: string | null): string | null {
    if (given !== null && given < doneOn) throw new AppError('validation_failed', 'The next due date is before the date it was done', { nextDueOn: 'On or after the date it was done' });
    return nextDueDate(doneOn, months, given);
  }

  return {
    async overview(boothId: number): Promise<BoothUpkeep> {
      const booth = await data.booths.findOneBy({ id: boothId });
      if (!booth) throw notFound('Booth');
      const shop = await settings.get();
      const today = shopDay(clock.now(), shop);
      const recent = { order: { id: 'DESC' as const }, take: recentCount, where: { boothId } };
      const [banks, latest, readings, changes, extractionTests, fireInspections] = await Promise.all([
        banksOf(data, boothId, true),
        latestTests(data, boothId),
        data.gaugeReadings.find({ ...recent, order: { at: 'DESC', id: 'DESC' } }),
        data.filterChanges.find({ ...recent, order: { changedAt: 'DESC', id: 'DESC' } }),
        data.extractionTests.find({ ...recent, order: { testedOn: 'DESC', id: 'DESC' } }),
        data.fireInspections.find({ ...recent, order: { inspectedOn: 'DESC', id: 'DESC' } }),
      ]);
      const due = (nextDueOn: string | null | undefined) => ({ status: nextDueOn === undefined ? ('none' as const) : dueStatus(nextDueOn, today, shop.upkeepDueSoonDays), nextDueOn: nextDueOn ?? null });
      return {
        booth: { id: booth.id, name: booth.name, siteId: booth.siteId, minFaceVelocityMps: booth.minFaceVelocityMps },
        banks,
        extraction: { ...due(latest.extraction ? latest.extraction.nextDueOn : undefined), latest: latest.extraction && toExtractionTestDto(latest.extraction) },
        fire: { ...due(latest.fire ? latest.fire.nextDueOn : undefined), latest: latest.fire && toFireInspectionDto(latest.fire) },
        history: { readings: readings.map(toGaugeReadingDto), changes: changes.map(toFilterChangeDto), extractionTests: extractionTests.map(toExtractionTestDto), fireInspections: fireInspections.map(toFireInspectionDto) },
        intervals: { extractionTestMonths: shop.extractionTestMonths, fireInspectionMonths: shop.fireInspectionMonths, dueSoonDays: shop.upkeepDueSoonDays },
      };
    },

    async createBank(input: CreateFilterBankInput, actor: Actor): Promise<FilterBank> {
      const fields = createFilterBankSchema.parse(input);
      const booth = await boothOrField(fields.boothId);
      const now = clock.now().toISOString();
      const bank = await data.transaction(async (tx) => {
        const saved = await tx.filterBanks.save(tx.filterBanks.create({ ...fields, createdAt: now, updatedAt: now }));
        await recordAudit(tx, actor, { action: 'create', entity: 'filter-bank', entityId: saved.id, summary: `Added filter bank ${saved.name} to ${booth.name}`, siteId: booth.siteId }, clock.now());
        return saved;
      });
      return (await banksOf(data, bank.boothId, true)).find((b) => b.id === bank.id)!;
    },

    async updateBank(id: number, patch: UpdateFilterBankInput, actor: Actor): Promise<FilterBank> {
      const boothId = await data.transaction(async (tx) => {
        const bank = await tx.filterBanks.findOneBy({ id });
        if (!bank) throw notFound('Filter bank');
        const booth = await tx.booths.findOneBy({ id: bank.boothId });
        const changes = changedFields(bank, patch);
        Object.assign(bank, patch, { updatedAt: clock.now().toISOString() });
        await tx.filterBanks.save(bank);
        await recordAudit(tx, actor, { action: 'update', entity: 'filter-bank', entityId: id, summary: `Changed filter bank ${bank.name}`, changes, siteId: booth?.siteId ?? null }, clock.now());
        return bank.boothId;
      });
      return (await banksOf(data, boothId, true)).find((b) => b.id === id)!;
    },

    /** A gauge reading; a sensor may post only for the banks of its own booth. */
    async recordGaugeReading(input: CreateGaugeReadingInput, source: RecordSource): Promise<GaugeReading> {
      const fields = createGaugeReadingSchema.parse(input);
      const bank = await bankOrField(fields.filterBankId);
      if (source.sensorBoothId !== undefined && bank.boothId !== source.sensorBoothId) throw new AppError('forbidden', 'This sensor token belongs to another booth');
      const at = instantOrNow(fields.at, 'at');
      const reading = await data.transaction((tx) =>
        tx.gaugeReadings.save(
          tx.gaugeReadings.create({ filterBankId: bank.id, boothId: bank.boothId, pressureDropPa: fields.pressureDropPa, at, source: source.actor ? 'typed' : 'sensor', recordedById: source.actor?.id ?? null, recordedByName: source.actor?.name ?? 'Booth sensor' }),
        ),
      );
      return toGaugeReadingDto(reading);
    },

    async recordFilterChange(input: CreateFilterChangeInput, actor: Actor): Promise<FilterChange> {
      const fields = createFilterChangeSchema.parse(input);
      const bank = await bankOrField(fields.filterBankId);
      const changedAt = instantOrNow(fields.changedAt, 'changedAt');
      const change = await data.transaction(async (tx) => {
        const saved = await tx.filterChanges.save(tx.filterChanges.create({ ...fields, boothId: bank.boothId, changedAt, changedById: actor.id, changedByName: actor.name }));
        const booth = await tx.booths.findOneBy({ id: bank.boothId });
        await recordAudit(tx, actor, { action: 'create', entity: 'filter-change', entityId: saved.id, summary: `Changed the filters of ${bank.name}`, siteId: booth?.siteId ?? null }, clock.now());
        return saved;
      });
      return toFilterChangeDto(change);
    },

    async recordExtractionTest(input: CreateExtractionTestInput, actor: Actor): Promise<ExtractionTest> {
      const fields = createExtractionTestSchema.parse(input);
      const booth = await boothOrField(fields.boothId);
      await notAfterToday(fields.testedOn, 'testedOn');
      const shop = await settings.get();
      const nextDueOn = dueDate(fields.testedOn, shop.extractionTestMonths, fields.nextDueOn);
      const mean = meanFaceVelocityMps(fields.faceVelocityPointsMps);
      const test = await data.transaction(async (tx) => {
        const row = tx.extractionTests.create({ ...fields, nextDueOn, meanFaceVelocityMps: mean, minFaceVelocityMps: booth.minFaceVelocityMps, recordedById: actor.id, recordedByName: actor.name, recordedAt: clock.now().toISOString() });
        const saved = await tx.extractionTests.save(row);
        await recordAudit(tx, actor, { action: 'create', entity: 'extraction-test', entityId: saved.id, summary: `Recorded an extraction test of ${booth.name}`, siteId: booth.siteId }, clock.now());
        return saved;
      });
      return toExtractionTestDto(test);
    },

    async recordFireInspection(input: CreateFireInspectionInput, actor: Actor): Promise<FireInspection> {
      const fields = createFireInspectionSchema.parse(input);
      const booth = await boothOrField(fields.boothId);
      await notAfterToday(fields.inspectedOn, 'inspectedOn');
      const nextDueOn = dueDate(fields.inspectedOn, (await settings.get()).fireInspectionMonths, fields.nextDueOn);
      const inspection = await data.transaction(async (tx) => {
        const saved = await tx.fireInspections.save(tx.fireInspections.create({ ...fields, nextDueOn, recordedById: actor.id, recordedByName: actor.name, recordedAt: clock.now().toISOString() }));
        await recordAudit(tx, actor, { action: 'create', entity: 'fire-inspection', entityId: saved.id, summary: `Recorded a fire-protection inspection of ${booth.name}`, siteId: booth.siteId }, clock.now());
        return saved;
      });
      return toFireInspectionDto(inspection);
    },
  };
}

export type UpkeepService = ReturnType<typeof createUpkeepService>;
