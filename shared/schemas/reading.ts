import { z } from 'zod';
import { idSchema, isoInstantSchema, listSchema, pageFields } from './common';
import { siteFilterFields } from './site';

export const createReadingSchema = z
  .object({
    boothId: z.number().int().positive().nullable().default(null),
    rackId: z.number().int().positive().nullable().default(null),
    at: isoInstantSchema.optional(),
    airTempC: z.number({ error: 'Enter the air temperature' }).min(-30).max(70),
    relativeHumidityPct: z.number({ error: 'Enter the relative humidity' }).min(0).max(100, 'RH cannot be over 100 %'),
    surfaceTempC: z.number().min(-30).max(90).nullable().default(null),
  })
  .refine((r) => r.boothId !== null || r.rackId !== null, { message: 'Say which booth or rack this reading is from', path: ['boothId'] });
export type CreateReadingInput = z.input<typeof createReadingSchema>;

export const readingSchema = z.object({
  id: z.number().int(),
  boothId: z.number().int().nullable(),
  rackId: z.number().int().nullable(),
  at: z.string(),
  airTempC: z.number(),
  relativeHumidityPct: z.number(),
  surfaceTempC: z.number().nullable(),
  dewPointC: z.number(),
  source: z.enum(['typed', 'sensor']),
});
export type Reading = z.infer<typeof readingSchema>;

export const readingQuerySchema = z.object({
  boothId: idSchema.optional(),
  rackId: idSchema.optional(),
  ...pageFields(50, 500),
  ...siteFilterFields,
});

export const readingResponseSchema = z.object({ reading: readingSchema });
export const readingListSchema = listSchema(readingSchema);
