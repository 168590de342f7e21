import { z } from 'zod';
import { idSchema } from './common';
import { siteFilterFields } from './site';

/** Roles a spray session can be given to: the sprayers, and the lead who sprays when short-handed. */
export const sprayerRoles = ['sprayer', 'lead'] as const;

/** `boothId`: the people of that booth's site; left out, the caller's own site (an admin: every site, or `?siteId`). */
export const sprayerQuerySchema = z.object({ ...siteFilterFields, boothId: idSchema.optional() });
export type SprayerQuery = z.infer<typeof sprayerQuerySchema>;

export const sprayerSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  role: z.enum(sprayerRoles),
  siteId: z.number().int(),
});
export type Sprayer = z.infer<typeof sprayerSchema>;

export const sprayerListSchema = z.object({ items: z.array(sprayerSchema) });
