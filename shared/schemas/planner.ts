import { z } from 'zod';
import { createSpraySessionSchema, spraySessionSchema } from './spray-session';

export const planRequestSchema = z.object({
  /** Empty or missing: every job not delivered or cancelled. */
  jobIds: z.array(z.number().int().positive()).max(500).default([]),
  horizonDays: z.number().int().min(1).max(60).default(14),
});
export type PlanRequest = z.input<typeof planRequestSchema>;

export const plannedSessionSchema = z.object({
  jobId: z.number().int(),
  stepPosition: z.number().int(),
  /** "Coat n of m": the step's place among the job's coat steps, and how many there are. */
  coatNumber: z.number().int().default(0),
  coatsTotal: z.number().int().default(0),
  /** The grit of the denib due before this coat (the system's own step, or a scuff after a closed window); null when none. */
  denibBeforeGrit: z.string().nullable().default(null),
  boothId: z.number().int(),
  start: z.string(),
  end: z.string(),
  productName: z.string(),
  areaM2: z.number(),
  partIds: z.array(z.number().int()),
});
export type PlannedSession = z.infer<typeof plannedSessionSchema>;

export const planSchema = z.object({
  sessions: z.array(plannedSessionSchema),
  jobs: z.array(
    z.object({ jobId: z.number().int(), reference: z.string(), dueDate: z.string(), finishesAt: z.string().nullable(), dueDateMet: z.boolean(), notes: z.array(z.string()) }),
  ),
});
export type Plan = z.infer<typeof planSchema>;

export const acceptPlanSchema = z.object({ sessions: z.array(createSpraySessionSchema).min(1, 'Nothing to book').max(500) });
export const acceptPlanResponseSchema = z.object({ items: z.array(spraySessionSchema) });

export const planResponseSchema = z.object({ plan: planSchema });
