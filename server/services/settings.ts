import type { ShopSettings } from '../../shared/schemas/settings';
import type { SiteData } from '../data/site-data';
import type { ShopSettingsEntity } from '../db/entities/shop-settings.entity';
import { systemClock, type Clock } from '../lib/clock';
import { changedFields, recordAudit, type Actor } from './audit';

export const defaultShopSettings: ShopSettings = {
  shopName: 'My finishing shop',
  timezone: 'Europe/London',
  locale: 'en-GB',
  currency: 'GBP',
  defaultUnits: 'metric',
  planningDryingTempC: 20,
  setupMin: 15,
  cleanDownMin: 20,
  yearlySolventThresholdKg: 5000,
  dailyPlanHour: 6,
  // UK HSE HSG258: local exhaust ventilation thoroughly examined and tested at least every 14 months.
  extractionTestMonths: 14,
  // Yearly: common practice, no published source; the fire authority and the equipment maker decide.
  fireInspectionMonths: 12,
  // Yearly face-fit tests: common practice, no published source (an annual test is also a US OSHA rule, from memory).
  fitTestMonths: 12,
  // Yearly health surveillance for isocyanate work after the first months (HSE G402, from memory).
  healthSurveillanceMonths: 12,
  // Warn 30 days ahead: common practice, no published source.
  upkeepDueSoonDays: 30,
};

function toSettingsDto(row: ShopSettingsEntity): ShopSettings {
  const { shopName, timezone, locale, currency, defaultUnits, planningDryingTempC, setupMin, cleanDownMin, yearlySolventThresholdKg, dailyPlanHour } = row;
  const { extractionTestMonths, fireInspectionMonths, fitTestMonths, healthSurveillanceMonths, upkeepDueSoonDays } = row;
  return {
    ...{ shopName, timezone, locale, currency, defaultUnits, planningDryingTempC, setupMin, cleanDownMin, yearlySolventThresholdKg, dailyPlanHour },
    ...{ extractionTestMonths, fireInspectionMonths, fitTestMonths, healthSurveillanceMonths, upkeepDueSoonDays },
  };
}

/** The shop's settings are the group's: one timezone and one set of planning defaults for every site. */
export function createSettingsService(data: SiteData, clock: Clock = systemClock) {
  return {
    async get(): Promise<ShopSettings> {
      const row = await data.settings.findOneBy({ id: 1 });
      return row ? toSettingsDto(row) : defaultShopSettings;
    },

    async update(patch: Partial<ShopSettings>, actor: Actor): Promise<ShopSettings> {
      const now = clock.now();
      return data.transaction(async (tx) => {
        const existing = await tx.settings.findOneBy({ id: 1 });
        const row = existing ?? tx.settings.create({ id: 1, ...defaultShopSettings });
        const changes = changedFields(row, patch);
        Object.assign(row, patch, { updatedAt: now.toISOString() });
        await tx.settings.save(row);
        await recordAudit(tx, actor, { action: 'update', entity: 'settings', entityId: 1, summary: 'Changed shop settings', changes }, now);
        return toSettingsDto(row);
      });
    },
  };
}

export type SettingsService = ReturnType<typeof createSettingsService>;
