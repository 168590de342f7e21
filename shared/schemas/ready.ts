import { z } from 'zod';
import { readinessStates } from '../finishing/readiness';
import { idSchema } from './common';
import { siteFilterFields } from './site';

export const readyQuerySchema = z.object({
  jobId: idSchema.optional(),
  rackId: idSchema.optional(),
  ...siteFilterFields,
  state: z.enum(readinessStates).optional(),
});

export const readyPartSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  jobId: z.number().int(),
  jobReference: z.string(),
  customer: z.string(),
  state: z.enum(readinessStates),
  coatsDone: z.number().int(),
  coatsTotal: z.number().int(),
  nextStep: z.string().nullable(),
  nextWindowOpensAt: z.string().nullable(),
  nextWindowClosesAt: z.string().nullable(),
  abradeRequired: z.boolean(),
  handleAt: z.string().nullable(),
  packAt: z.string().nullable(),
  fullCureAt: z.string().nullable(),
  rack: z.object({ id: z.number().int(), name: z.string(), shelf: z.number().int().nullable() }).nullable(),
});
export type ReadyPart = z.infer<typeof readyPartSchema>;
