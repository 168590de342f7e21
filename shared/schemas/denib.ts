import { z } from 'zod';
import { idempotencyKeySchema, idSchema, isoInstantSchema, listSchema, optionalTextSchema, pageFields } from './common';
import { siteFilterFields } from './site';

/**
 * A denib (or a scuff after a missed recoat window) between coats: which parts, with what grit,
 * who and when. Append-only like coat records; a wrong one is answered by recording another.
 */
export const createDenibSchema = z.object({
  spraySessionId: z.number({ error: 'Choose the spray session' }).int().positive(),
  partIds: z.array(z.number().int().positive()).min(1, 'Choose at least one part').max(2000),
  grit: z.string().trim().regex(/^P\d{2,4}$/, 'Give the grit as a P-grade, e.g. P320'),
  abradedAt: isoInstantSchema,
  notes: optionalTextSchema(2000).default(''),
  idempotencyKey: idempotencyKeySchema.nullable().default(null),
});
export type CreateDenibInput = z.input<typeof createDenibSchema>;

export const denibSchema = z.object({
  id: z.number().int(),
  spraySessionId: z.number().int(),
  partIds: z.array(z.number().int()),
  grit: z.string(),
  abradedAt: z.string(),
  notes: z.string(),
  recordedById: z.number().int().nullable(),
  recordedByName: z.string(),
  recordedAt: z.string(),
});
export type Denib = z.infer<typeof denibSchema>;

export const denibQuerySchema = z.object({
  partId: idSchema.optional(),
  spraySessionId: idSchema.optional(),
  jobId: idSchema.optional(),
  from: isoInstantSchema.optional(),
  to: isoInstantSchema.optional(),
  ...pageFields(100, 500),
  ...siteFilterFields,
});
export type DenibQuery = z.infer<typeof denibQuerySchema>;

export const denibResponseSchema = z.object({ denib: denibSchema });
export const denibListSchema = listSchema(denibSchema);
