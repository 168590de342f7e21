import { z } from 'zod';
import { idSchema, isoInstantSchema, optionalTextSchema, requiredTextSchema } from './common';
import { siteFilterFields } from './site';

/** A calendar date in the shop's zone: upkeep falls due on a day, not at an hour. */
export const calendarDateSchema = z.iso.date({ error: 'Use a date like 2027-03-31' });
const freeText = (max: number) => optionalTextSchema(max);
const who = requiredTextSchema('Say who did it (a name, or the firm)', 120, 2);
const pascals = (label: string) => z.number({ error: `Enter ${label}` }).min(0, 'A pressure drop is 0 Pa or more').max(5000, 'That is more than a booth gauge shows (5000 Pa)');

export const dueStatuses = ['valid', 'due-soon', 'lapsed', 'none'] as const;
export const dueStatusSchema = z.enum(dueStatuses);
export const dueStatusLabels: Record<(typeof dueStatuses)[number], string> = { valid: 'Valid', 'due-soon': 'Due soon', lapsed: 'Lapsed', none: 'None recorded' };

export const filterBankKinds = ['paint-arrestor', 'pre-filter', 'ceiling-intake', 'exhaust', 'carbon', 'other'] as const;
export const filterBankKindLabels: Record<(typeof filterBankKinds)[number], string> = {
  'paint-arrestor': 'Paint arrestor (overspray)',
  'pre-filter': 'Pre-filter',
  'ceiling-intake': 'Ceiling / intake',
  exhaust: 'Exhaust / final',
  carbon: 'Activated carbon',
  other: 'Other',
};
export const filterStatuses = ['ok', 'near-limit', 'over-limit', 'no-reading'] as const;
export const filterStatusLabels: Record<(typeof filterStatuses)[number], string> = { ok: 'Within limit', 'near-limit': 'Near its limit', 'over-limit': 'Change now', 'no-reading': 'No reading' };

// Kept free of defaults: a PATCH must never reset a field the caller did not send.
export const filterBankFieldsSchema = z.object({
  name: requiredTextSchema('Name the bank (e.g. "Arrestor pads, back wall")', 80),
  kind: z.enum(filterBankKinds, { error: 'Choose the kind of filter' }),
  changeAtPa: z.number({ error: 'Enter the pressure drop the maker says to change at' }).int('Whole pascals').min(10, 'At least 10 Pa').max(5000, 'At most 5000 Pa'),
  active: z.boolean(),
});
export const createFilterBankSchema = filterBankFieldsSchema.extend({ boothId: z.number({ error: 'Choose the booth' }).int().positive(), active: z.boolean().default(true) });
export type CreateFilterBankInput = z.input<typeof createFilterBankSchema>;
export const updateFilterBankSchema = filterBankFieldsSchema.partial();
export type UpdateFilterBankInput = z.infer<typeof updateFilterBankSchema>;

export const createGaugeReadingSchema = z.object({
  filterBankId: z.number({ error: 'Choose the filter bank' }).int().positive(),
  pressureDropPa: pascals('the gauge reading'),
  at: isoInstantSchema.optional(),
});
export type CreateGaugeReadingInput = z.input<typeof createGaugeReadingSchema>;

export const createFilterChangeSchema = z.object({
  filterBankId: z.number({ error: 'Choose the filter bank' }).int().positive(),
  changedAt: isoInstantSchema.optional(),
  beforePa: pascals('the reading before').nullable().default(null),
  afterPa: pascals('the reading after').nullable().default(null),
  notes: freeText(500).default(''),
});
export type CreateFilterChangeInput = z.input<typeof createFilterChangeSchema>;

export const createExtractionTestSchema = z.object({
  boothId: z.number({ error: 'Choose the booth' }).int().positive(),
  testedOn: calendarDateSchema,
  faceVelocityPointsMps: z.array(z.number({ error: 'Enter each reading in m/s' }).min(0, 'A speed is 0 m/s or more').max(20, 'At most 20 m/s')).min(1, 'Enter at least one face velocity reading').max(50, 'At most 50 readings'),
  clearanceMin: z.number().positive('A clearance time must be more than 0').max(600).nullable().default(null),
  testedBy: who,
  /** Left out: the test date plus the shop's interval. */
  nextDueOn: calendarDateSchema.nullable().default(null),
  notes: freeText(1000).default(''),
});
export type CreateExtractionTestInput = z.input<typeof createExtractionTestSchema>;

export const createFireInspectionSchema = z.object({
  boothId: z.number({ error: 'Choose the booth' }).int().positive(),
  inspectedOn: calendarDateSchema,
  inspectedBy: who,
  passed: z.boolean({ error: 'Say whether it passed' }),
  nextDueOn: calendarDateSchema.nullable().default(null),
  notes: freeText(1000).default(''),
});
export type CreateFireInspectionInput = z.input<typeof createFireInspectionSchema>;

export const gaugeReadingSchema = z.object({ id: z.number().int(), filterBankId: z.number().int(), boothId: z.number().int(), pressureDropPa: z.number(), at: z.string(), source: z.enum(['typed', 'sensor']), recordedByName: z.string() });
export type GaugeReading = z.infer<typeof gaugeReadingSchema>;
export const filterChangeSchema = z.object({ id: z.number().int(), filterBankId: z.number().int(), boothId: z.number().int(), changedAt: z.string(), beforePa: z.number().nullable(), afterPa: z.number().nullable(), notes: z.string(), changedByName: z.string() });
export type FilterChange = z.infer<typeof filterChangeSchema>;
export const extractionTestSchema = z.object({
  id: z.number().int(),
  boothId: z.number().int(),
  testedOn: z.string(),
  faceVelocityPointsMps: z.array(z.number()),
  meanFaceVelocityMps: z.number(),
  meetsMinimum: z.boolean(),
  clearanceMin: z.number().nullable(),
  testedBy: z.string(),
  nextDueOn: z.string().nullable(),
  notes: z.string(),
  recordedByName: z.string(),
  recordedAt: z.string(),
});
export type ExtractionTest = z.infer<typeof extractionTestSchema>;
export const fireInspectionSchema = z.object({ id: z.number().int(), boothId: z.number().int(), inspectedOn: z.string(), inspectedBy: z.string(), passed: z.boolean(), nextDueOn: z.string().nullable(), notes: z.string(), recordedByName: z.string(), recordedAt: z.string() });
export type FireInspection = z.infer<typeof fireInspectionSchema>;

export const filterBankSchema = filterBankFieldsSchema.extend({
  id: z.number().int(),
  boothId: z.number().int(),
  status: z.enum(filterStatuses),
  currentPa: z.number().nullable(),
  latestReading: gaugeReadingSchema.nullable(),
  lastChange: filterChangeSchema.nullable(),
});
export type FilterBank = z.infer<typeof filterBankSchema>;

const dueOf = z.object({ status: dueStatusSchema, nextDueOn: z.string().nullable() });

/** Everything about one booth's upkeep: its filter banks, its last tests and the recent record. */
export const boothUpkeepSchema = z.object({
  booth: z.object({ id: z.number().int(), name: z.string(), siteId: z.number().int(), minFaceVelocityMps: z.number() }),
  banks: z.array(filterBankSchema),
  extraction: dueOf.extend({ latest: extractionTestSchema.nullable() }),
  fire: dueOf.extend({ latest: fireInspectionSchema.nullable() }),
  history: z.object({ readings: z.array(gaugeReadingSchema), changes: z.array(filterChangeSchema), extractionTests: z.array(extractionTestSchema), fireInspections: z.array(fireInspectionSchema) }),
  intervals: z.object({ extractionTestMonths: z.number().int(), fireInspectionMonths: z.number().int(), dueSoonDays: z.number().int() }),
});
export type BoothUpkeep = z.infer<typeof boothUpkeepSchema>;

export const upkeepItemKinds = ['filter', 'extraction-test', 'fire-inspection', 'fit-test', 'health-surveillance', 'training'] as const;
export const upkeepDueItemSchema = z.object({ kind: z.enum(upkeepItemKinds), status: z.enum(['due-soon', 'lapsed', 'none', 'near-limit', 'over-limit', 'failed']), message: z.string() });
export type UpkeepDueItem = z.infer<typeof upkeepDueItemSchema>;

/** For the lead's Today board: the booths and people of the caller's sites that are not fit to spray, or soon will not be. */
export const upkeepDueSchema = z.object({
  asOf: z.string(),
  booths: z.array(z.object({ boothId: z.number().int(), boothName: z.string(), siteId: z.number().int(), fit: z.boolean(), items: z.array(upkeepDueItemSchema) })),
  crew: z.array(z.object({ userId: z.number().int(), name: z.string(), siteId: z.number().int(), fit: z.boolean(), items: z.array(upkeepDueItemSchema) })),
  /** False when the caller may see only their own crew records (a sprayer). */
  wholeCrew: z.boolean(),
});
export type UpkeepDue = z.infer<typeof upkeepDueSchema>;
export const upkeepDueQuerySchema = z.object({ ...siteFilterFields, withinDays: z.string().regex(/^[0-9]{1,3}$/, 'Give a whole number of days').transform(Number).pipe(z.number().max(365)).optional() });

export const boothUpkeepParamsSchema = z.object({ id: idSchema });

/** The fit-to-spray verdict of one session, for each respiratory protection the sprayer may wear. */
const findingSchema = z.object({ code: z.string(), subject: z.enum(['booth', 'sprayer']), severity: z.enum(['stop', 'caution']), message: z.string(), rule: z.string() });
export type FitnessFindingDto = z.infer<typeof findingSchema>;
const assessmentSchema = z.object({ verdict: z.enum(['go', 'caution', 'stop']), findings: z.array(findingSchema) });
export const sessionFitnessSchema = z.object({
  spraySessionId: z.number().int(),
  /** False when the viewer may not see the assigned sprayer's records: only the booth is assessed. */
  crewShown: z.boolean(),
  neededRespirator: z.enum(['air-fed', 'vapour-and-particulate', 'particulate']),
  byRespirator: z.object({ 'air-fed': assessmentSchema, 'vapour-and-particulate': assessmentSchema, particulate: assessmentSchema }),
  deferLine: z.string(),
});
export type SessionFitness = z.infer<typeof sessionFitnessSchema>;

/** The envelopes the upkeep routes answer with, for the server's route table and the client alike. */
export const boothUpkeepResponseSchema = z.object({ upkeep: boothUpkeepSchema });
export const upkeepDueResponseSchema = z.object({ due: upkeepDueSchema });
export const filterBankResponseSchema = z.object({ filterBank: filterBankSchema });
export const gaugeReadingResponseSchema = z.object({ reading: gaugeReadingSchema });
export const filterChangeResponseSchema = z.object({ filterChange: filterChangeSchema });
export const extractionTestResponseSchema = z.object({ extractionTest: extractionTestSchema });
export const fireInspectionResponseSchema = z.object({ fireInspection: fireInspectionSchema });
export const sessionFitnessResponseSchema = z.object({ fitness: sessionFitnessSchema });
