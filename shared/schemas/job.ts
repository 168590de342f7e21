import { z } from 'zod';
import { sprayMethodIds } from '../finishing/material';
import { listSchema, optionalTextSchema, pageFields, queryNumberSchema, requiredTextSchema } from './common';

/**
 * A job's life cycle: open → in finish (its first coat is on) → ready (every part can be handled)
 * → delivered (every part collected; closed). Set by the server as coats and collections are
 * recorded; a lead may set it too. Cancelled only by a lead.
 */
export const jobStates = ['open', 'in-finish', 'ready', 'delivered', 'cancelled'] as const;
export const jobStateSchema = z.enum(jobStates, { error: 'Unknown job state' });
export type JobState = z.infer<typeof jobStateSchema>;

/**
 * Older clients knew "finished" for a job that was done and gone; it is read as "delivered"
 * wherever a state is sent (create, change, list filter). Answers never carry it.
 */
export const legacyJobStates = { finished: 'delivered' } as const satisfies Record<string, JobState>;
const acceptedStates = [...jobStates, ...(Object.keys(legacyJobStates) as (keyof typeof legacyJobStates)[])] as const;
export const jobStateInputSchema = z
  .enum(acceptedStates, { error: 'Unknown job state' })
  .transform((state): JobState => (state in legacyJobStates ? legacyJobStates[state as keyof typeof legacyJobStates] : (state as JobState)));

/** Jobs not yet delivered or cancelled: the ones that can be late. */
export const liveJobStates: readonly JobState[] = ['open', 'in-finish', 'ready'];
/** Who set the state last: the server from what was recorded, or a lead by hand. */
export const jobStateSources = ['auto', 'lead'] as const;

const isoDate = z.iso.date({ error: 'Use a date like 2027-03-31' });

export const jobFieldsSchema = z.object({
  customer: requiredTextSchema('Enter the customer', 120),
  reference: requiredTextSchema('Enter the job reference', 60),
  dueDate: isoDate,
  finishSystemId: z.number().int().positive().nullable(),
  colour: optionalTextSchema(80),
  sheen: optionalTextSchema(40),
  notes: optionalTextSchema(4000),
  state: jobStateInputSchema,
});

const f = jobFieldsSchema.shape;
export const createJobSchema = jobFieldsSchema.extend({
  finishSystemId: f.finishSystemId.default(null),
  colour: f.colour.default(''),
  sheen: f.sheen.default(''),
  notes: f.notes.default(''),
  state: f.state.default('open'),
});
export type CreateJobInput = z.input<typeof createJobSchema>;
export const updateJobSchema = jobFieldsSchema.partial();
export type UpdateJobInput = z.infer<typeof updateJobSchema>;

export const jobSchema = jobFieldsSchema.extend({
  state: jobStateSchema,
  stateSetBy: z.enum(jobStateSources),
  /** Once every coat is on: when the last part can be handled (the job turns ready then). */
  readyAt: z.string().nullable(),
  id: z.number().int(),
  finishSystemName: z.string().nullable(),
  partCount: z.number().int(),
  /** Parts whose last coat of the finish system is on: the job's progress. */
  partsThrough: z.number().int(),
  coatedAreaM2: z.number(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Job = z.infer<typeof jobSchema>;

export const jobListQuerySchema = z.object({
  q: z.string().trim().max(80).optional(),
  /** One state, or `active` for every job not delivered or cancelled. */
  state: z.union([z.literal('active'), jobStateInputSchema]).optional(),
  ...pageFields(50, 200),
});
export type JobListQuery = z.infer<typeof jobListQuerySchema>;

export const estimateQuerySchema = z.object({
  method: z.enum(sprayMethodIds, { error: 'Unknown spray method' }).default('hvlp'),
  transferEfficiencyPct: queryNumberSchema(1, 100).optional(),
});
export type EstimateQuery = z.infer<typeof estimateQuerySchema>;

const mixQuantitiesSchema = z.object({ baseL: z.number(), hardenerL: z.number(), thinnerL: z.number(), totalL: z.number() });

/** A job's material estimate (shared/finishing/estimate.ts) with the spray method it assumed. */
export const estimateSchema = z.object({
  areaM2: z.number(),
  transferEfficiencyPct: z.number(),
  method: z.string(),
  /** The shop's currency (ISO 4217) that every cost is in; format with moneyWords (shared/words.ts). */
  currency: z.string(),
  steps: z.array(
    z.object({
      position: z.number().int(),
      productId: z.number().int(),
      productName: z.string(),
      dryFilmUm: z.number(),
      mixedL: z.number(),
      readyToSprayL: z.number(),
      mix: mixQuantitiesSchema,
      vocG: z.number().nullable(),
      cost: z.number().nullable(),
    }),
  ),
  totals: z.object({
    mixedL: z.number(),
    readyToSprayL: z.number(),
    vocG: z.number(),
    cost: z.number(),
    stepsWithoutVoc: z.number().int(),
    stepsWithoutPrice: z.number().int(),
  }),
});
export type Estimate = z.infer<typeof estimateSchema>;

export const jobResponseSchema = z.object({ job: jobSchema });
export const jobListSchema = listSchema(jobSchema);
export const estimateResponseSchema = z.object({ estimate: estimateSchema });
