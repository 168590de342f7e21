import { z } from 'zod';
import { siteFilterSchema } from './site';
import { sprayerSchema } from './sprayer';
import { upkeepDueSchema } from './upkeep';
import { sessionWorkSchema, spraySessionStateSchema } from './spray-session';

const date = z.string().regex(/^\d{4}-\d{2}-\d{2}$/);

export const nextStepSchema = z.object({
  kind: z.enum(['checklist', 'checklist-stop', 'start-spraying', 'mix', 'coat', 'stop-spraying', 'clearance', 'finish', 'done', 'cancelled']),
  words: z.string(),
  /** A time the words lead up to ("keep protection on until …"), shown in shop time. */
  at: z.string().nullable(),
});
export type NextStepDto = z.infer<typeof nextStepSchema>;

/** A session on the day's board: where, when, who, what it sprays and what comes next in it. */
export const todaySessionSchema = z.object({
  id: z.number().int(),
  boothId: z.number().int(),
  boothName: z.string(),
  start: z.string(),
  end: z.string(),
  /** The shop date the session starts on. */
  date,
  sprayerId: z.number().int().nullable(),
  sprayerName: z.string().nullable(),
  state: spraySessionStateSchema,
  work: sessionWorkSchema,
  nextStep: nextStepSchema,
});
export type TodaySession = z.infer<typeof todaySessionSchema>;

/** Parts of one job whose next coat must go on before their recoat window closes today. */
export const recoatClosingSchema = z.object({
  jobId: z.number().int(),
  jobReference: z.string(),
  customer: z.string(),
  partCount: z.number().int(),
  closesAt: z.string(),
  nextStep: z.string(),
  /** A live session that plans the next coat on these parts before the window closes, if any. */
  bookedSessionId: z.number().int().nullable(),
  bookedStart: z.string().nullable(),
});

/** Parts of one job that must be denibbed (a planned abrade step, or a missed recoat window) before their next coat. */
export const denibWaitingSchema = z.object({
  jobId: z.number().int(),
  jobReference: z.string(),
  customer: z.string(),
  partCount: z.number().int(),
  grit: z.string(),
  /** Parts whose recoat window closed before they got their next coat. */
  missedWindowCount: z.number().int(),
});

export const jobAtRiskSchema = z.object({
  jobId: z.number().int(),
  jobReference: z.string(),
  customer: z.string(),
  dueDate: date,
  reason: z.enum(['overdue', 'finishes-late', 'cannot-plan']),
  words: z.string(),
});

export const staleSensorSchema = z.object({
  boothId: z.number().int(),
  boothName: z.string(),
  lastReadingAt: z.string().nullable(),
});

export const todayBoothSchema = z.object({ id: z.number().int(), name: z.string(), siteId: z.number().int() });

export const leadBoardSchema = z.object({
  view: z.literal('lead'),
  generatedAt: z.string(),
  today: date,
  tomorrow: date,
  booths: z.array(todayBoothSchema),
  /** Today's and tomorrow's sessions (not cancelled), by start. */
  sessions: z.array(todaySessionSchema),
  /** Who sessions can be given to, with their site, for assigning from the board. */
  sprayers: z.array(sprayerSchema),
  recoatClosing: z.array(recoatClosingSchema),
  denibWaiting: z.array(denibWaitingSchema),
  jobsAtRisk: z.array(jobAtRiskSchema),
  staleSensors: z.array(staleSensorSchema),
  /** Booths and people of the site not fit to spray now, or not soon: filters, extraction tests, fit tests. */
  upkeepDue: upkeepDueSchema,
});

export const sprayerBoardSchema = z.object({
  view: z.literal('sprayer'),
  generatedAt: z.string(),
  today: date,
  /** My sessions today (not cancelled), by start. */
  mySessions: z.array(todaySessionSchema),
  /** My next session after today, for a quiet day. */
  nextSession: todaySessionSchema.nullable(),
  /** Sessions today at my site that nobody has been given yet. */
  unassignedToday: z.number().int(),
});

export const todayBoardSchema = z.discriminatedUnion('view', [leadBoardSchema, sprayerBoardSchema]);
export type TodayBoard = z.infer<typeof todayBoardSchema>;
export type LeadBoard = z.infer<typeof leadBoardSchema>;
export type SprayerBoard = z.infer<typeof sprayerBoardSchema>;
export const todayResponseSchema = z.object({ today: todayBoardSchema });

/** `?siteId=` lets an admin look at one site; everyone else sees their own. */
export const todayQuerySchema = siteFilterSchema;
