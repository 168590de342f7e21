import { z } from 'zod';
import { unitSystemSchema, requiredTextSchema } from './common';

export const shopSettingsSchema = z.object({
  shopName: requiredTextSchema('Enter the shop name', 120),
  timezone: z.string().refine(isKnownTimeZone, 'Unknown timezone'),
  /** How dates, times and numbers are written for the shop (BCP 47, e.g. en-GB). */
  locale: z.string().max(35).refine(isKnownLocale, 'Give a language and region such as en-GB or de-DE'),
  /** The currency prices and costs are in (ISO 4217, e.g. GBP). */
  currency: z.string().refine(isKnownCurrency, 'Give a three-letter currency code such as GBP, EUR or USD'),
  defaultUnits: unitSystemSchema,
  planningDryingTempC: z.number().min(5).max(60),
  setupMin: z.number().int().min(0).max(240),
  cleanDownMin: z.number().int().min(0).max(240),
  yearlySolventThresholdKg: z.number().min(0).max(1000000),
  dailyPlanHour: z.number().int().min(0).max(23),
  // Upkeep and crew protection intervals: defaults are in server/services/settings.ts with their sources.
  extractionTestMonths: z.number().int().min(1, 'At least 1 month').max(60, 'At most 60 months'),
  fireInspectionMonths: z.number().int().min(1, 'At least 1 month').max(60, 'At most 60 months'),
  fitTestMonths: z.number().int().min(1, 'At least 1 month').max(60, 'At most 60 months'),
  healthSurveillanceMonths: z.number().int().min(1, 'At least 1 month').max(60, 'At most 60 months'),
  upkeepDueSoonDays: z.number().int().min(1, 'At least 1 day').max(180, 'At most 180 days'),
});
export type ShopSettings = z.infer<typeof shopSettingsSchema>;
export const updateShopSettingsSchema = shopSettingsSchema.partial();

function isKnownLocale(locale: string): boolean {
  try {
    return Intl.getCanonicalLocales(locale).length === 1;
  } catch {
    return false;
  }
}

function isKnownCurrency(code: string): boolean {
  return /^[A-Z]{3}$/.test(code) && Intl.supportedValuesOf('currency').includes(code);
}

function isKnownTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export const shopSettingsResponseSchema = z.object({ settings: shopSettingsSchema });
