import { z } from 'zod';
import { idSchema } from './common';

export { reworkReasonLabels, reworkReasons, type ReworkReason } from './coat';

/** A calendar date in the shop's timezone; report ranges are whole days, both ends included. */
export const reportDateSchema = z.iso.date({ error: 'Use a date such as 2026-03-31' });

/** Longest range one report covers: enough for two years side by side, small enough to stay quick. */
export const maxReportDays = 800;

const rangeFields = {
  from: reportDateSchema,
  to: reportDateSchema,
  /** `csv` answers with a CSV file of the report's table instead of JSON. */
  format: z.enum(['json', 'csv']).default('json'),
  /** One site's figures; an admin may pick any site (or none for the whole group), everyone else gets their own. */
  siteId: idSchema.optional(),
};

function checkRange(value: { from: string; to: string }, ctx: z.RefinementCtx) {
  const days = (Date.parse(value.to) - Date.parse(value.from)) / 86_400_000;
  if (days < 0) ctx.addIssue({ code: 'custom', path: ['to'], message: 'The end date is before the start date' });
  else if (days >= maxReportDays) ctx.addIssue({ code: 'custom', path: ['to'], message: `A report covers at most ${maxReportDays} days; shorten the range` });
}

const optionalId = idSchema.optional();

export const reportRangeQuerySchema = z.object(rangeFields).superRefine(checkRange);
export type ReportRangeQuery = z.infer<typeof reportRangeQuerySchema>;

export const boothUseQuerySchema = z.object({ ...rangeFields, boothId: optionalId }).superRefine(checkRange);
export type BoothUseQuery = z.infer<typeof boothUseQuerySchema>;

export const areaGroupings = ['product-kind', 'job'] as const;
export const areaSprayedQuerySchema = z.object({ ...rangeFields, groupBy: z.enum(areaGroupings).default('product-kind') }).superRefine(checkRange);
export type AreaSprayedQuery = z.infer<typeof areaSprayedQuerySchema>;

export const conditionsQuerySchema = z.object({ ...rangeFields, boothId: idSchema }).superRefine(checkRange);
export type ConditionsQuery = z.infer<typeof conditionsQuerySchema>;

export const materialQuerySchema = z.object({ ...rangeFields, jobId: optionalId }).superRefine(checkRange);
export type MaterialQuery = z.infer<typeof materialQuerySchema>;

const rangeEcho = { from: z.string(), to: z.string(), timezone: z.string(), siteId: z.number().int().nullable() };

/** Week rows start on the shop's Monday. */
export const boothUseRowSchema = z.object({
  weekStart: z.string(),
  boothId: z.number().int(),
  boothName: z.string(),
  sessions: z.number().int(),
  bookedHours: z.number(),
  /** From the checklist's start of spraying (or the first coat) to clearing (or the last coat). */
  sprayedHours: z.number(),
});
export const boothUseReportSchema = z.object({ report: z.object({ ...rangeEcho, rows: z.array(boothUseRowSchema) }) });
export type BoothUseReport = z.infer<typeof boothUseReportSchema>['report'];

export const areaSprayedRowSchema = z.object({
  weekStart: z.string(),
  /** The product kind (`primer`, …) or the job id as text. */
  key: z.string(),
  label: z.string(),
  coats: z.number().int(),
  areaM2: z.number(),
});
export const areaSprayedReportSchema = z.object({ report: z.object({ ...rangeEcho, groupBy: z.enum(areaGroupings), rows: z.array(areaSprayedRowSchema) }) });
export type AreaSprayedReport = z.infer<typeof areaSprayedReportSchema>['report'];

export const conditionsPointSchema = z.object({
  /** Start of the hour (ranges up to 7 days) or of the shop day. */
  at: z.string(),
  readings: z.number().int(),
  airTempC: z.number(),
  relativeHumidityPct: z.number(),
  /** The smallest margin of the surface (or, without one, the air) above the dew point in the bucket. */
  dewPointMarginC: z.number(),
});
export const outsideLimitReasons = ['air-too-cold', 'surface-too-cold', 'rh-too-high', 'dew-point-margin'] as const;
export const conditionsCoatSchema = z.object({
  coatId: z.number().int(),
  sprayedAt: z.string(),
  productId: z.number().int(),
  productName: z.string(),
  airTempC: z.number(),
  surfaceTempC: z.number(),
  relativeHumidityPct: z.number(),
  dewPointMarginC: z.number(),
  reasons: z.array(z.enum(outsideLimitReasons)),
});
export const conditionsLimitSchema = z.object({
  productId: z.number().int(),
  productName: z.string(),
  minApplicationTempC: z.number().nullable(),
  maxRelativeHumidityPct: z.number().nullable(),
});
export const conditionsReportSchema = z.object({
  report: z.object({
    ...rangeEcho,
    boothId: z.number().int(),
    boothName: z.string(),
    bucket: z.enum(['hour', 'day']),
    points: z.array(conditionsPointSchema),
    /** Products sprayed in this booth in the range, with their limits. */
    limits: z.array(conditionsLimitSchema),
    /** Smallest surface margin above dew point that counts as go (°C). */
    minDewPointMarginC: z.number(),
    coatCount: z.number().int(),
    /** Every coat made outside its product's limits or the dew-point margin. */
    coatsOutside: z.array(conditionsCoatSchema),
  }),
});
export type ConditionsReport = z.infer<typeof conditionsReportSchema>['report'];

export const solventMonthSchema = z.object({
  month: z.string(),
  litres: z.number(),
  vocKg: z.number(),
  runningTotalKg: z.number(),
  /** Litres mixed of products whose data sheet gives no VOC figure (not in vocKg). */
  litresWithoutVoc: z.number(),
});
export const solventReportSchema = z.object({
  report: z.object({ ...rangeEcho, thresholdKg: z.number(), totalKg: z.number(), rows: z.array(solventMonthSchema) }),
});
export type SolventReport = z.infer<typeof solventReportSchema>['report'];

export const materialRowSchema = z.object({
  jobId: z.number().int(),
  jobReference: z.string(),
  customer: z.string(),
  productId: z.number().int(),
  productName: z.string(),
  /** Ready-to-spray litres the job's finish system needs (default spray method). */
  estimatedL: z.number(),
  /** Litres mixed for the job so far: each pot shared among the jobs it coated by area. */
  usedL: z.number(),
});
export const materialProductTotalSchema = z.object({ productId: z.number().int(), productName: z.string(), estimatedL: z.number(), usedL: z.number() });
export const materialReportSchema = z.object({
  report: z.object({ ...rangeEcho, rows: z.array(materialRowSchema), byProduct: z.array(materialProductTotalSchema) }),
});
export type MaterialReport = z.infer<typeof materialReportSchema>['report'];

export const reworkKinds = ['corrected', 'repeated'] as const;
export const reworkRowSchema = z.object({
  month: z.string(),
  kind: z.enum(reworkKinds),
  /** A correction's reason as typed (trimmed, lower case), or a re-spray's reason code. */
  reason: z.string(),
  count: z.number().int(),
});
export const reworkReportSchema = z.object({ report: z.object({ ...rangeEcho, coatCount: z.number().int(), rows: z.array(reworkRowSchema) }) });
export type ReworkReport = z.infer<typeof reworkReportSchema>['report'];

export const upkeepReportKinds = ['filter-change', 'extraction-test', 'fire-inspection', 'fit-test', 'health-surveillance', 'training'] as const;
/**
 * One kind of upkeep for one booth (or, for crew records, the site's people together): how many were
 * done in the range, how many fell due in it, and how many of those were done again by their due date.
 * Filter changes fall due on the gauge, not the calendar: their `due` is null.
 */
export const upkeepReportRowSchema = z.object({
  boothId: z.number().int().nullable(),
  boothName: z.string().nullable(),
  kind: z.enum(upkeepReportKinds),
  done: z.number().int(),
  due: z.number().int().nullable(),
  doneByDue: z.number().int().nullable(),
});
export const upkeepReportSchema = z.object({ report: z.object({ ...rangeEcho, rows: z.array(upkeepReportRowSchema) }) });
export type UpkeepReport = z.infer<typeof upkeepReportSchema>['report'];
