import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { UnitSystem } from '../../../shared/schemas/common';

/** One row (id 1): the shop's own settings. */
@Entity({ name: 'shop_settings' })
export class ShopSettingsEntity {
  @PrimaryColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  shopName: string;

  @Column({ type: 'varchar', length: 64 })
  timezone: string;

  @Column({ type: 'varchar', length: 10 })
  defaultUnits: UnitSystem;

  @Column({ type: 'varchar', length: 35, default: 'en-GB' })
  locale: string;

  @Column({ type: 'varchar', length: 3, default: 'GBP' })
  currency: string;

  @Column({ type: 'double precision' })
  planningDryingTempC: number;

  @Column({ type: 'integer' })
  setupMin: number;

  @Column({ type: 'integer' })
  cleanDownMin: number;

  @Column({ type: 'double precision' })
  yearlySolventThresholdKg: number;

  @Column({ type: 'integer' })
  dailyPlanHour: number;

  @Column({ type: 'integer', default: 14 })
  extractionTestMonths: number;

  @Column({ type: 'integer', default: 12 })
  fireInspectionMonths: number;

  @Column({ type: 'integer', default: 12 })
  fitTestMonths: number;

  @Column({ type: 'integer', default: 12 })
  healthSurveillanceMonths: number;

  @Column({ type: 'integer', default: 30 })
  upkeepDueSoonDays: number;

  @Column({ type: 'varchar', length: 30 })
  updatedAt: string;
}
