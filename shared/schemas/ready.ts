import { z } from 'zod';
import { readinessStates } from '../finishing/readiness';
import { idSchema, queryIntSchema } from './common';
import { siteFilterFields } from './site';

export const readyQuerySchema = z.object({
  jobId: idSchema.optional(),
  rackId: idSchema.optional(),
  ...siteFilterFields,
  state: z.enum(readinessStates).optional(),
  /** Collected parts stay on the board this many days (a week unless asked); a job asked for by id shows all of its parts. */
  collectedDays: queryIntSchema(0, 90).default(7),
});
export type ReadyQuery = z.infer<typeof readyQuerySchema>;

const rackPlaceSchema = z.object({ id: z.number().int(), name: z.string(), shelf: z.number().int().nullable() });

export const readyPartSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  jobId: z.number().int(),
  jobReference: z.string(),
  customer: z.string(),
  state: z.enum(readinessStates),
  coatsDone: z.number().int(),
  coatsTotal: z.number().int(),
  /** The next step in words ("Denib P320", "Coat 2 of 3 at 40 µm dry"); read the structured fields below rather than this text. */
  nextStep: z.string().nullable(),
  /** What the next step is: a coat, or a denib (the finish system's abrade step, or a scuff after a missed window); null when none remains. */
  nextStepKind: z.enum(['coat', 'denib']).nullable().default(null),
  /** The denib's grit ("P320") when the next step is a denib. */
  nextStepGrit: z.string().nullable().default(null),
  /** The dry film the finish system asks of the next coat, in µm, when the next step is a coat. */
  nextStepDryFilmUm: z.number().nullable().default(null),
  nextWindowOpensAt: z.string().nullable(),
  nextWindowClosesAt: z.string().nullable(),
  abradeRequired: z.boolean(),
  /** The last coat's own times; while coats remain they are between-coats times, not "ready". */
  handleAt: z.string().nullable(),
  packAt: z.string().nullable(),
  fullCureAt: z.string().nullable(),
  rack: rackPlaceSchema.nullable(),
  /** Coat steps of the finish system still to go on. */
  coatsRemaining: z.number().int().default(0),
  /** When the next coat can go on at the earliest (window open, denib done, booked session); null when none remains. */
  nextCoatAt: z.string().nullable().default(null),
  /** When the part can be handled and packed once every coat is on; an estimate at the shop's drying temperature while coats remain. */
  expectedHandleAt: z.string().nullable().default(null),
  expectedPackAt: z.string().nullable().default(null),
  /** The latest denib since the last coat, if any. */
  denibbedAt: z.string().nullable().default(null),
  collectedAt: z.string().nullable().default(null),
  /** Where it was taken from when collected. */
  collectedFrom: rackPlaceSchema.nullable().default(null),
});
export type ReadyPart = z.infer<typeof readyPartSchema>;

/** A job as a whole: ready to handle (and to pack) when its last part not yet collected is. */
export const readyJobSchema = z.object({
  jobId: z.number().int(),
  jobReference: z.string(),
  handleAt: z.string().nullable(),
  packAt: z.string().nullable(),
  coatsRemaining: z.number().int(),
  partsCounted: z.number().int(),
  partsCollected: z.number().int(),
  partsUnknown: z.number().int(),
  /** True while coats remain: the times assume each goes on as soon as its window opens. */
  projected: z.boolean(),
  /** The drying temperature the estimate assumes (the shop's expected drying temperature). */
  dryingTempC: z.number(),
});
export type ReadyJob = z.infer<typeof readyJobSchema>;

export const readyListSchema = z.object({ items: z.array(readyPartSchema), jobs: z.array(readyJobSchema).default([]) });

/** What a wall screen asks for: how many job cards and next-ready parts it has room for. */
export const readySummaryQuerySchema = z.object({
  ...siteFilterFields,
  jobs: queryIntSchema(1, 24).default(6),
  next: queryIntSchema(1, 24).default(6),
});
export type ReadySummaryQuery = z.infer<typeof readySummaryQuerySchema>;

const stateCountsSchema = z.partialRecord(z.enum(readinessStates), z.number().int());

/** A job with parts still to collect, counted per state at the answer's moment. */
export const readySummaryJobSchema = z.object({
  jobId: z.number().int(),
  jobReference: z.string(),
  customer: z.string(),
  counts: stateCountsSchema,
  /** Parts on the board not yet collected. */
  partsLeft: z.number().int(),
  /** The next instant at which one of the job's counts changes with no write (a part dries on, a collected part leaves the board); null when none will. */
  nextChangeAt: z.string().nullable(),
});

/** A part drying after its last coat, soonest ready to handle first. */
export const readySummaryPartSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  jobReference: z.string(),
  handleAt: z.string().nullable(),
  rack: rackPlaceSchema.nullable(),
});

/**
 * The board in brief, for a wall screen: a few KB whatever the shop's size. Counts are worked out
 * at `asOf`; they change by themselves next at `nextChangeAt`, so a screen asks again then.
 */
export const readySummarySchema = z.object({
  /** Jobs with parts still to collect and at least one coat on, the most to pick up first; at most `?jobs=`. */
  jobs: z.array(readySummaryJobSchema),
  /** How many such jobs there are in all. */
  jobsInFinish: z.number().int(),
  /** Jobs whose parts all wait for a first coat, by reference; at most `waitingShown`. */
  waitingJobs: z.array(z.object({ jobReference: z.string(), parts: z.number().int() })),
  waitingJobsCount: z.number().int(),
  /** At most `?next=` parts. */
  nextReady: z.array(readySummaryPartSchema),
  /** Every part on the board, per state. */
  totals: stateCountsSchema,
  nextChangeAt: z.string().nullable(),
  asOf: z.string(),
});
export type ReadySummary = z.infer<typeof readySummarySchema>;
export type ReadySummaryJob = z.infer<typeof readySummaryJobSchema>;
export type ReadySummaryPart = z.infer<typeof readySummaryPartSchema>;

export const readySummaryResponseSchema = z.object({ summary: readySummarySchema });
