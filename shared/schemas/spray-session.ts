import { z } from 'zod';
import { checklistResultSchema, checklistSchema } from './checklist';
import { idempotencyKeySchema, idSchema, isoInstantSchema, listSchema, optionalTextSchema, pageFields, requiredTextSchema } from './common';
import { siteFilterFields } from './site';
import { chemistrySchema, hazardSchema } from './product';

export const spraySessionStates = ['planned', 'checking', 'spraying', 'clearing', 'done', 'cancelled'] as const;
export const spraySessionStateSchema = z.enum(spraySessionStates, { error: 'Unknown spray session state' });
export type SpraySessionState = z.infer<typeof spraySessionStateSchema>;

export const spraySessionStateLabels: Record<SpraySessionState, string> = {
  planned: 'Planned',
  checking: 'Pre-spray checks',
  spraying: 'Spraying',
  clearing: 'Clearing the air',
  done: 'Done',
  cancelled: 'Cancelled',
};

/** A part and the finish-system step (index) the session will spray on it. */
export const sessionItemSchema = z.object({
  partId: z.number().int().positive(),
  stepPosition: z.number().int().min(0).nullable().default(null),
});

/** A lead may go ahead outside opening hours or past rack space, never over another booking. */
export const overrideSchema = z.object({ reason: requiredTextSchema('Say why this booking goes ahead anyway', 500, 3) });

const spraySessionFields = {
  boothId: z.number({ error: 'Choose a booth' }).int().positive('Choose a booth'),
  start: isoInstantSchema,
  end: isoInstantSchema,
  sprayerId: z.number().int().positive().nullable(),
  notes: optionalTextSchema(2000),
  items: z.array(sessionItemSchema).max(2000),
  override: overrideSchema.nullable(),
};

const endAfterStart = (value: { start?: string; end?: string }) => !value.start || !value.end || Date.parse(value.end) > Date.parse(value.start);
const endAfterStartIssue = { message: 'The end must be after the start', path: ['end'] };

export const createSpraySessionSchema = z
  .object({
    ...spraySessionFields,
    sprayerId: spraySessionFields.sprayerId.default(null),
    notes: spraySessionFields.notes.default(''),
    items: spraySessionFields.items.default([]),
    override: spraySessionFields.override.default(null),
  })
  .refine(endAfterStart, endAfterStartIssue);
export type CreateSpraySessionInput = z.input<typeof createSpraySessionSchema>;

export const updateSpraySessionSchema = z
  .object({
    ...spraySessionFields,
    state: spraySessionStateSchema,
    checklist: checklistSchema,
    /** When the checks or the state change happened, for a tablet that sends them after being offline. */
    changedAt: isoInstantSchema,
    idempotencyKey: idempotencyKeySchema,
  })
  .partial()
  .refine(endAfterStart, endAfterStartIssue);
export type UpdateSpraySessionInput = z.infer<typeof updateSpraySessionSchema>;

export const spraySessionQuerySchema = z.object({
  from: isoInstantSchema.optional(),
  to: isoInstantSchema.optional(),
  boothId: idSchema.optional(),
  ...pageFields(500, 1000),
  ...siteFilterFields,
});
export type SpraySessionQuery = z.infer<typeof spraySessionQuerySchema>;

/** A planned part: the step it is to get and, once that step's coat is on record, when it went on. */
export const sessionItemDtoSchema = z.object({
  partId: z.number().int(),
  stepPosition: z.number().int().nullable(),
  /** When the part's coat of this step was sprayed (in this session or another); null while still to spray. */
  sprayedAt: z.string().nullable().default(null),
});
export type SessionItemDto = z.infer<typeof sessionItemDtoSchema>;

/** One coat the session sprays on one job's parts: "coat 1 of 3, Kestrel primer, 8 parts". */
export const sessionCoatSchema = z.object({
  jobId: z.number().int(),
  jobReference: z.string(),
  colour: z.string(),
  stepPosition: z.number().int(),
  /** Which coat of the finish system this is (1-based), and how many coats it has. */
  coatNumber: z.number().int(),
  coatsTotal: z.number().int(),
  productId: z.number().int(),
  productName: z.string(),
  partCount: z.number().int(),
  sprayedCount: z.number().int(),
});
export type SessionCoat = z.infer<typeof sessionCoatSchema>;

/** When the session's parts may take their coat: the previous coat's recoat window, shared by every part. */
export const sessionRecoatWindowSchema = z.object({
  opensAt: z.string(),
  closesAt: z.string().nullable(),
  /** True when the previous coat is booked but not sprayed yet: worked out from its session's end. */
  projected: z.boolean(),
});

/** What a session sprays, in words a planner block can show. */
export const sessionWorkSchema = z.object({
  partCount: z.number().int(),
  sprayedCount: z.number().int(),
  jobs: z.array(z.object({ id: z.number().int(), reference: z.string(), colour: z.string() })),
  coats: z.array(sessionCoatSchema),
  recoatWindow: sessionRecoatWindowSchema.nullable(),
});
export type SessionWork = z.infer<typeof sessionWorkSchema>;

export const emptySessionWork: SessionWork = { partCount: 0, sprayedCount: 0, jobs: [], coats: [], recoatWindow: null };

export const spraySessionSchema = z.object({
  id: z.number().int(),
  boothId: z.number().int(),
  boothName: z.string(),
  start: z.string(),
  end: z.string(),
  sprayerId: z.number().int().nullable(),
  sprayerName: z.string().nullable(),
  state: spraySessionStateSchema,
  notes: z.string(),
  items: z.array(sessionItemDtoSchema),
  overrideReason: z.string().nullable(),
  checklist: checklistResultSchema.nullable(),
  /** When spraying stopped and the air started to clear; the clearance countdown runs from here. */
  clearingStartedAt: z.string().nullable(),
  work: sessionWorkSchema.default(emptySessionWork),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type SpraySession = z.infer<typeof spraySessionSchema>;

/** The safety cautions of one spray session, worked out on the server for every role. */
export const spraySessionCautionsSchema = z.object({
  products: z.array(z.object({ name: z.string(), chemistry: chemistrySchema, hazards: z.array(hazardSchema) })),
  cautions: z.array(z.object({ code: z.string(), title: z.string(), message: z.string() })),
});
export type SpraySessionCautions = z.infer<typeof spraySessionCautionsSchema>;

export const spraySessionResponseSchema = z.object({ spraySession: spraySessionSchema });
export const spraySessionListSchema = listSchema(spraySessionSchema);
