import { z } from 'zod';
import { listSchema, optionalTextSchema, requiredTextSchema } from './common';

const gritSchema = z.string().trim().regex(/^P\d{2,4}$/, 'Give the grit as a P-grade, e.g. P320');

export const finishStepInputSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({
      kind: z.literal('coat'),
      productId: z.number({ error: 'Choose a product' }).int().positive('Choose a product'),
      dryFilmUm: z.number({ error: 'Enter the dry film target in µm' }).positive('Dry film must be more than 0').max(1000),
    }),
    z.object({ kind: z.literal('abrade'), grit: gritSchema }),
  ],
  { error: 'Each step is a coat or a denib' },
);
export type FinishStepInput = z.infer<typeof finishStepInputSchema>;

export const finishSystemFieldsSchema = z.object({
  name: requiredTextSchema('Enter a name', 120),
  description: optionalTextSchema(1000),
  steps: z
    .array(finishStepInputSchema)
    .min(1, 'Add at least one step')
    .max(30)
    .refine((steps) => steps.some((s) => s.kind === 'coat'), 'A finish system needs at least one coat'),
});

export const createFinishSystemSchema = finishSystemFieldsSchema.extend({
  description: finishSystemFieldsSchema.shape.description.default(''),
});
export type CreateFinishSystemInput = z.input<typeof createFinishSystemSchema>;
export const updateFinishSystemSchema = finishSystemFieldsSchema.partial();
export type UpdateFinishSystemInput = z.infer<typeof updateFinishSystemSchema>;

export const finishStepSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('coat'), position: z.number().int(), productId: z.number().int(), productName: z.string(), dryFilmUm: z.number() }),
  z.object({ kind: z.literal('abrade'), position: z.number().int(), grit: z.string() }),
]);
export type FinishStep = z.infer<typeof finishStepSchema>;

export const finishSystemSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  description: z.string(),
  steps: z.array(finishStepSchema),
  coatCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type FinishSystem = z.infer<typeof finishSystemSchema>;

export const finishSystemResponseSchema = z.object({ finishSystem: finishSystemSchema });
export const finishSystemListSchema = listSchema(finishSystemSchema);
