import { z } from 'zod';
import { idSchema, listSchema, requiredTextSchema } from './common';

/** A workshop of the group: booths, racks and people belong to one. */
export const siteFieldsSchema = z.object({
  name: requiredTextSchema('Enter a name', 80),
});
export const createSiteSchema = siteFieldsSchema;
export type CreateSiteInput = z.input<typeof createSiteSchema>;
export const updateSiteSchema = siteFieldsSchema.partial();
export type UpdateSiteInput = z.infer<typeof updateSiteSchema>;

export const siteSchema = siteFieldsSchema.extend({
  id: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Site = z.infer<typeof siteSchema>;

/** Where a booth, rack or user belongs; optional on create (the creator's own site). */
export const siteIdSchema = z.number({ error: 'Choose a site' }).int().positive('Choose a site');

/** `?siteId=` on lists and reports: an admin may pick a site; everyone else sees their own. */
export const siteFilterFields = { siteId: idSchema.optional() };
export const siteFilterSchema = z.object(siteFilterFields);

export const siteResponseSchema = z.object({ site: siteSchema });
export const siteListSchema = listSchema(siteSchema);
