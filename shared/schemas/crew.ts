import { z } from 'zod';
import { idSchema, optionalTextSchema, requiredTextSchema } from './common';
import { siteFilterFields } from './site';
import { calendarDateSchema, dueStatusSchema } from './upkeep';

export const crewRecordKinds = ['fit-test', 'health-surveillance', 'training'] as const;
export type CrewRecordKind = (typeof crewRecordKinds)[number];
export const crewRecordKindLabels: Record<CrewRecordKind, string> = {
  'fit-test': 'Respirator face-fit test',
  'health-surveillance': 'Health surveillance (isocyanate work)',
  training: 'Training',
};

const common = {
  doneOn: calendarDateSchema,
  /** Left out: the date plus the shop's interval (none for training). */
  nextDueOn: calendarDateSchema.nullable().default(null),
  notes: optionalTextSchema(1000).default(''),
};

/** One record per kind, each with the fields that kind needs, so a message lands on the field it is about. */
export const createCrewRecordSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({
      kind: z.literal('fit-test'),
      ...common,
      respiratorModel: requiredTextSchema('Name the respirator tested (maker, model, size)', 120, 2),
      result: z.enum(['pass', 'fail'], { error: 'Say whether it was a pass or a fail' }),
    }),
    z.object({ kind: z.literal('health-surveillance'), ...common }),
    z.object({ kind: z.literal('training'), ...common, title: requiredTextSchema('Say what the training was', 120, 2) }),
  ],
  { error: 'Choose what kind of record this is' },
);
export type CreateCrewRecordInput = z.input<typeof createCrewRecordSchema>;

export const crewRecordSchema = z.object({
  id: z.number().int(),
  userId: z.number().int(),
  kind: z.enum(crewRecordKinds),
  doneOn: z.string(),
  nextDueOn: z.string().nullable(),
  respiratorModel: z.string().nullable(),
  result: z.enum(['pass', 'fail']).nullable(),
  title: z.string().nullable(),
  notes: z.string(),
  recordedByName: z.string(),
  recordedAt: z.string(),
});
export type CrewRecord = z.infer<typeof crewRecordSchema>;

/** What a lead may see of a person: the status of each kind of record, nothing more. */
export const crewStatusSchema = z.object({
  userId: z.number().int(),
  name: z.string(),
  role: z.enum(['admin', 'lead', 'sprayer', 'assembler']),
  siteId: z.number().int(),
  fitTest: dueStatusSchema,
  healthSurveillance: dueStatusSchema,
  training: dueStatusSchema,
});
export type CrewStatus = z.infer<typeof crewStatusSchema>;

/** The person themself, or an admin: every record, with the same statuses. */
export const crewDetailSchema = z.object({ status: crewStatusSchema, records: z.array(crewRecordSchema) });
export type CrewDetail = z.infer<typeof crewDetailSchema>;

export const crewUserParamsSchema = z.object({ userId: idSchema });
export const crewStatusQuerySchema = z.object(siteFilterFields);

export const crewStatusListSchema = z.object({ items: z.array(crewStatusSchema) });
export const crewDetailResponseSchema = z.object({ crew: crewDetailSchema });
export const crewRecordResponseSchema = z.object({ record: crewRecordSchema });
