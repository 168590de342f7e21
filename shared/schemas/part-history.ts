import { z } from 'zod';
import { finishStepSchema } from './finish-system';
import { readyPartSchema } from './ready';

/** A coat as the part's history shows it to every role: what went on, when and by whom, and its times. */
export const partHistoryCoatSchema = z.object({
  kind: z.literal('coat'),
  id: z.number().int(),
  at: z.string(),
  spraySessionId: z.number().int(),
  stepPosition: z.number().int().nullable(),
  productName: z.string(),
  dryFilmUm: z.number().nullable(),
  recordedByName: z.string(),
  recoatOpensAt: z.string(),
  recoatClosesAt: z.string().nullable(),
  handleAt: z.string(),
  packAt: z.string(),
  /** A re-spray of a step the part already had (rework), or a correction of an earlier record. */
  rework: z.boolean(),
  version: z.number().int(),
});

export const partHistoryDenibSchema = z.object({
  kind: z.literal('denib'),
  id: z.number().int(),
  at: z.string(),
  spraySessionId: z.number().int(),
  grit: z.string(),
  notes: z.string(),
  recordedByName: z.string(),
});

export const partHistoryEntrySchema = z.discriminatedUnion('kind', [partHistoryCoatSchema, partHistoryDenibSchema]);
export type PartHistoryEntry = z.infer<typeof partHistoryEntrySchema>;

export const partHistorySchema = z.object({
  partId: z.number().int(),
  /** Where the part stands now, its next step and its times (as on the ready board). */
  readiness: readyPartSchema,
  /** Its finish system's steps in order; empty when the job has none. */
  steps: z.array(finishStepSchema),
  /** Current coat versions and denibs, oldest first. */
  entries: z.array(partHistoryEntrySchema),
  /** The drying temperature the expected times assume for coats not yet sprayed. */
  dryingTempC: z.number(),
});
export type PartHistory = z.infer<typeof partHistorySchema>;

export const partHistoryResponseSchema = z.object({ history: partHistorySchema });
