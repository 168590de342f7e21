import { z } from 'zod';
import { listSchema, requiredTextSchema } from './common';
import { siteIdSchema } from './site';

export const rackLocations = ['drying-room', 'booth-side'] as const;
export const rackLocationSchema = z.enum(rackLocations, { error: 'Choose where the rack stands' });
export type RackLocation = z.infer<typeof rackLocationSchema>;

export const rackLocationLabels: Record<RackLocation, string> = {
  'drying-room': 'Drying room',
  'booth-side': 'Beside the booth',
};

// Kept free of defaults: a PATCH must never reset a field the caller did not send.
export const rackFieldsSchema = z.object({
  name: requiredTextSchema('Enter a name', 80),
  location: rackLocationSchema,
  shelves: z.number().int('Whole shelves only').min(1, 'At least one shelf').max(100),
  shelfAreaM2: z.number().positive('Shelf area must be more than 0').max(50),
  dryingTempC: z.number().min(5, 'Below 5 °C is not a drying temperature').max(80, 'Above 80 °C is out of range').nullable(),
  siteId: siteIdSchema,
});

const f = rackFieldsSchema.shape;
export const createRackSchema = rackFieldsSchema.extend({
  location: f.location.default('drying-room'),
  shelves: f.shelves.default(10),
  shelfAreaM2: f.shelfAreaM2.default(1),
  dryingTempC: f.dryingTempC.default(null),
  siteId: f.siteId.optional(),
});
export type CreateRackInput = z.input<typeof createRackSchema>;
export const updateRackSchema = rackFieldsSchema.partial();
export type UpdateRackInput = z.infer<typeof updateRackSchema>;

export const rackSchema = rackFieldsSchema.extend({
  id: z.number().int(),
  totalAreaM2: z.number(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Rack = z.infer<typeof rackSchema>;

export const rackResponseSchema = z.object({ rack: rackSchema });
export const rackListSchema = listSchema(rackSchema);
