import { z } from 'zod';
import { idempotencyKeySchema, isoInstantSchema, requiredTextSchema } from './common';

export const respiratorKinds = ['air-fed', 'vapour-and-particulate', 'particulate'] as const;

/** The pre-spray checks a sprayer records before a session may start spraying. */
export const checklistSchema = z.object({
  extractionRunning: z.boolean(),
  filtersChecked: z.boolean(),
  faceVelocityMps: z.number().min(0).max(10).nullable(),
  respiratorFitted: z.boolean(),
  respiratorKind: z.enum(respiratorKinds, { error: 'Say which respiratory protection is worn' }),
  airTempC: z.number({ error: 'Enter the air temperature' }).min(-20).max(60),
  relativeHumidityPct: z.number({ error: 'Enter the relative humidity' }).min(1).max(100, 'RH cannot be over 100 %'),
  surfaceTempC: z.number({ error: 'Enter the surface temperature' }).min(-20).max(80),
  /** A lead's reason for starting despite a stop; recorded with the checklist. */
  overrideReason: requiredTextSchema('Say why spraying goes ahead', 500, 3).nullable().default(null),
});
export type Checklist = z.infer<typeof checklistSchema>;

export const checklistResultSchema = checklistSchema.extend({
  verdict: z.enum(['go', 'caution', 'stop']),
  problems: z.array(z.string()),
  /** Readings within their limits but close to them: information, not problems (absent on checklists recorded before notes existed). */
  notes: z.array(z.string()).optional(),
  completedAt: z.string(),
  completedByName: z.string(),
});
export type ChecklistResult = z.infer<typeof checklistResultSchema>;

export const createMixSchema = z.object({
  productId: z.number({ error: 'Choose the product' }).int().positive(),
  lotIds: z.array(z.number().int().positive()).max(4).default([]),
  wantedL: z.number({ error: 'Enter how much to mix' }).positive('Mix more than 0 L').max(200),
  thinningPct: z.number().min(0).max(100).default(0),
  mixedAt: isoInstantSchema.optional(),
  tempC: z.number({ error: 'Enter the mixing temperature' }).min(0).max(50),
  idempotencyKey: idempotencyKeySchema.nullable().default(null),
});
export type CreateMixInput = z.input<typeof createMixSchema>;

export const mixSchema = z.object({
  id: z.number().int(),
  spraySessionId: z.number().int(),
  productId: z.number().int(),
  productName: z.string(),
  lotIds: z.array(z.number().int()),
  baseL: z.number(),
  hardenerL: z.number(),
  thinnerL: z.number(),
  totalL: z.number(),
  mixedAt: z.string(),
  tempC: z.number(),
  inductionEndsAt: z.string(),
  potLifeEndsAt: z.string().nullable(),
  potLifeWarningAt: z.string().nullable(),
  recordedByName: z.string(),
});
export type Mix = z.infer<typeof mixSchema>;

export const mixResponseSchema = z.object({ mix: mixSchema });
/** The pots of one spray session, newest first (not paged: a session mixes a handful). */
export const mixListSchema = z.object({ items: z.array(mixSchema) });
