import { inTransaction } from '../db/transaction';
import type { DataSource } from 'typeorm';
import type { ShopSettings } from '../../shared/schemas/settings';
import { ShopSettingsEntity } from '../db/entities/shop-settings.entity';
import { systemClock, type Clock } from '../lib/clock';
import { changedFields, recordAudit, type Actor } from './audit';

export const defaultShopSettings: ShopSettings = {
  shopName: 'My finishing shop',
  timezone: 'Europe/London',
  defaultUnits: 'metric',
  planningDryingTempC: 20,
  setupMin: 15,
  cleanDownMin: 20,
  yearlySolventThresholdKg: 5000,
  dailyPlanHour: 6,
};

function toSettingsDto(row: ShopSettingsEntity): ShopSettings {
  const { shopName, timezone, defaultUnits, planningDryingTempC, setupMin, cleanDownMin, yearlySolventThresholdKg, dailyPlanHour } = row;
  return { shopName, timezone, defaultUnits, planningDryingTempC, setupMin, cleanDownMin, yearlySolventThresholdKg, dailyPlanHour };
}

export function createSettingsService(dataSource: DataSource, clock: Clock = systemClock) {
  return {
    async get(): Promise<ShopSettings> {
      const row = await dataSource.getRepository(ShopSettingsEntity).findOneBy({ id: 1 });
      return row ? toSettingsDto(row) : defaultShopSettings;
    },

    async update(patch: Partial<ShopSettings>, actor: Actor): Promise<ShopSettings> {
      const now = clock.now();
      return inTransaction(dataSource, async (manager) => {
        const existing = await manager.findOneBy(ShopSettingsEntity, { id: 1 });
        const row = existing ?? manager.create(ShopSettingsEntity, { id: 1, ...defaultShopSettings });
        const changes = changedFields(row, patch);
        Object.assign(row, patch, { updatedAt: now.toISOString() });
        await manager.save(row);
        await recordAudit(manager, actor, { action: 'update', entity: 'settings', entityId: 1, summary: 'Changed shop settings', changes }, now);
        return toSettingsDto(row);
      });
    },
  };
}

export type SettingsService = ReturnType<typeof createSettingsService>;
