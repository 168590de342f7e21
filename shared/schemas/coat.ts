import { z } from 'zod';
import { idSchema, isoInstantSchema, listSchema, optionalTextSchema, pageFields, queryFlagSchema, requiredTextSchema } from './common';
import { siteFilterFields } from './site';

export const acknowledgementSchema = z.object({
  code: z.string().min(1).max(60),
  reason: requiredTextSchema('Say why the coat went on anyway', 500, 3),
});

/** Why a step was sprayed again on parts that already had it (a re-spray, for the rework report). */
export const reworkReasons = ['run-or-sag', 'dust-or-debris', 'orange-peel', 'poor-coverage', 'damage', 'colour-or-sheen', 'other'] as const;
export type ReworkReason = (typeof reworkReasons)[number];
export const reworkReasonLabels: Record<ReworkReason, string> = {
  'run-or-sag': 'Run or sag',
  'dust-or-debris': 'Dust or debris',
  'orange-peel': 'Orange peel',
  'poor-coverage': 'Poor coverage',
  damage: 'Damaged in handling',
  'colour-or-sheen': 'Wrong colour or sheen',
  other: 'Other',
};

const coatFields = {
  spraySessionId: z.number({ error: 'Choose the spray session' }).int().positive(),
  partIds: z.array(z.number().int().positive()).min(1, 'Choose at least one part').max(2000),
  productId: z.number({ error: 'Choose the product' }).int().positive(),
  sprayedAt: isoInstantSchema,
  airTempC: z.number({ error: 'Enter the air temperature' }).min(-20, 'Air temperature looks wrong').max(60, 'Air temperature looks wrong'),
  relativeHumidityPct: z.number({ error: 'Enter the relative humidity' }).min(1, 'RH is between 1 and 100 %').max(100, 'RH cannot be over 100 %'),
  surfaceTempC: z.number({ error: 'Enter the surface temperature' }).min(-20, 'Surface temperature looks wrong').max(80, 'Surface temperature looks wrong'),
  thinningPct: z.number().min(0, 'Thinning cannot be negative').max(100),
  wetFilmUm: z.number().positive('Wet film must be more than 0').max(2000).nullable(),
  /** Which step of the parts' finish system this coat is; null lets the server take the next coat step. */
  stepPosition: z.number().int().min(0).nullable(),
  lotId: z.number().int().positive().nullable(),
  mixId: z.number().int().positive().nullable(),
  /** Where the parts dry; null means the rack's temperature if heated, else the air temperature. */
  dryingTempC: z.number().min(0).max(80).nullable(),
  acknowledgements: z.array(acknowledgementSchema).max(20),
  notes: optionalTextSchema(2000),
  reworkReason: z.enum(reworkReasons).nullable(),
  /** Lets a device resend a coat after a dropped connection without making a second record. */
  idempotencyKey: z.string().min(8).max(80).nullable(),
};

export const createCoatSchema = z.object({
  ...coatFields,
  thinningPct: coatFields.thinningPct.default(0),
  wetFilmUm: coatFields.wetFilmUm.default(null),
  stepPosition: coatFields.stepPosition.default(null),
  lotId: coatFields.lotId.default(null),
  mixId: coatFields.mixId.default(null),
  dryingTempC: coatFields.dryingTempC.default(null),
  acknowledgements: coatFields.acknowledgements.default([]),
  notes: coatFields.notes.default(''),
  reworkReason: coatFields.reworkReason.default(null),
  idempotencyKey: coatFields.idempotencyKey.default(null),
});
export type CreateCoatInput = z.input<typeof createCoatSchema>;

/**
 * A correction names only what changes, with the reason; the old version stays. Built from the
 * fields without their defaults, so a field the correction leaves out keeps its old value.
 */
export const correctCoatSchema = z
  .object(coatFields)
  .omit({ spraySessionId: true, idempotencyKey: true })
  .partial()
  .extend({ reason: requiredTextSchema('Say what was wrong', 500, 3) });
export type CorrectCoatInput = z.infer<typeof correctCoatSchema>;

export const coatWarningSchema = z.object({ code: z.string(), message: z.string(), acknowledgedReason: z.string().nullable().optional() });

export const coatSchema = z.object({
  id: z.number().int(),
  spraySessionId: z.number().int(),
  partIds: z.array(z.number().int()),
  /** The parts' labels, in the order of `partIds`: how people name the parts a coat covered. */
  partLabels: z.array(z.string()).default([]),
  productId: z.number().int(),
  productName: z.string(),
  lotId: z.number().int().nullable(),
  mixId: z.number().int().nullable(),
  stepPosition: z.number().int().nullable(),
  /** The job of the coat's parts (of its first part, should one coat cover parts of several jobs); null if none is on record. */
  jobId: z.number().int().nullable().default(null),
  jobReference: z.string().nullable().default(null),
  /** "Coat n of m": n is the coat's place among the coat steps of the job's finish system, null when it matches no coat step. */
  coatNumber: z.number().int().nullable().default(null),
  /** m: how many coat steps the job's finish system has; null when the job has no finish system. */
  coatsTotal: z.number().int().nullable().default(null),
  sprayedAt: z.string(),
  airTempC: z.number(),
  relativeHumidityPct: z.number(),
  surfaceTempC: z.number(),
  dewPointC: z.number(),
  thinningPct: z.number(),
  wetFilmUm: z.number().nullable(),
  dryFilmUm: z.number().nullable(),
  dryingTempC: z.number(),
  dryingMethod: z.string(),
  flashOffEndsAt: z.string(),
  recoatOpensAt: z.string(),
  recoatClosesAt: z.string().nullable(),
  touchDryAt: z.string(),
  handleAt: z.string(),
  packAt: z.string(),
  fullCureAt: z.string(),
  warnings: z.array(coatWarningSchema),
  notes: z.string(),
  reworkReason: z.enum(reworkReasons).nullable(),
  version: z.number().int(),
  replacesId: z.number().int().nullable(),
  supersededById: z.number().int().nullable(),
  correctionReason: z.string().nullable(),
  recordedById: z.number().int().nullable(),
  recordedByName: z.string(),
  recordedAt: z.string(),
});
export type Coat = z.infer<typeof coatSchema>;

export const coatQuerySchema = z.object({
  spraySessionId: idSchema.optional(),
  partId: idSchema.optional(),
  jobId: idSchema.optional(),
  productId: idSchema.optional(),
  from: isoInstantSchema.optional(),
  to: isoInstantSchema.optional(),
  /** Current versions only unless asked for the whole history. */
  history: queryFlagSchema.default(false),
  ...pageFields(50, 500),
  ...siteFilterFields,
});
export type CoatQuery = z.infer<typeof coatQuerySchema>;

export const coatResponseSchema = z.object({ coat: coatSchema });
/** POST /api/coats: `replayed` when the idempotency key had already made the record. */
export const coatCreatedResponseSchema = coatResponseSchema.extend({ replayed: z.boolean() });
export const coatListSchema = listSchema(coatSchema);
