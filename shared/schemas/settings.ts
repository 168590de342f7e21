import { z } from 'zod';
import { unitSystemSchema } from './common';

export const shopSettingsSchema = z.object({
  shopName: z.string().trim().min(1, 'Enter the shop name').max(120),
  timezone: z.string().refine(isKnownTimeZone, 'Unknown timezone'),
  defaultUnits: unitSystemSchema,
  planningDryingTempC: z.number().min(5).max(60),
  setupMin: z.number().int().min(0).max(240),
  cleanDownMin: z.number().int().min(0).max(240),
  yearlySolventThresholdKg: z.number().min(0).max(1000000),
  dailyPlanHour: z.number().int().min(0).max(23),
});
export type ShopSettings = z.infer<typeof shopSettingsSchema>;
export const updateShopSettingsSchema = shopSettingsSchema.partial();

function isKnownTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export const shopSettingsResponseSchema = z.object({ settings: shopSettingsSchema });
