import { z } from 'zod';
import { listSchema, requiredTextSchema } from './common';
import { siteIdSchema } from './site';

export const boothKinds = ['cross-draft', 'down-draft', 'open-face', 'spray-room'] as const;
export const boothKindSchema = z.enum(boothKinds, { error: 'Choose a booth kind' });
export type BoothKind = z.infer<typeof boothKindSchema>;

export const boothKindLabels: Record<BoothKind, string> = {
  'cross-draft': 'Cross-draft booth',
  'down-draft': 'Down-draft booth',
  'open-face': 'Open-face booth',
  'spray-room': 'Spray room',
};

const clockTime = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use 24-hour HH:MM');

/** One opening span; weekday is ISO (1 = Monday … 7 = Sunday). Times are in the shop's timezone. */
export const openingSpanSchema = z
  .object({ weekday: z.number().int().min(1).max(7), opens: clockTime, closes: clockTime })
  .refine((span) => span.opens < span.closes, { message: 'Closing time must be after opening time', path: ['closes'] });
export type OpeningSpan = z.infer<typeof openingSpanSchema>;

/** What a new booth form suggests: a working week. */
export const defaultOpeningHours: OpeningSpan[] = [1, 2, 3, 4, 5].map((weekday) => ({
  weekday,
  opens: '07:00',
  closes: '17:00',
}));

const positive = (label: string) => z.number({ error: `Enter the ${label.toLowerCase()}` }).positive(`${label} must be more than 0`);

// Kept free of defaults: a PATCH must never reset a field the caller did not send.
export const boothFieldsSchema = z.object({
  name: requiredTextSchema('Enter a name', 80),
  kind: boothKindSchema,
  volumeM3: positive('Internal volume').max(10000),
  extractionM3PerH: positive('Extraction rate').max(1000000),
  mixingFactorK: z.number().min(1, 'K is between 1 and 10').max(10, 'K is between 1 and 10'),
  measuredClearanceMin: z.number().positive('A measured clearance time must be more than 0').max(600).nullable(),
  minFaceVelocityMps: z.number().positive('Face velocity must be more than 0').max(10),
  openFaceAreaM2: z.number().positive('Open-face area must be more than 0').max(500).nullable(),
  openingHours: z.array(openingSpanSchema).max(21),
  sprayRateM2PerH: z.number().positive('Spray rate must be more than 0').max(1000),
  siteId: siteIdSchema,
});

const f = boothFieldsSchema.shape;
export const createBoothSchema = boothFieldsSchema.extend({
  mixingFactorK: f.mixingFactorK.default(3),
  measuredClearanceMin: f.measuredClearanceMin.default(null),
  minFaceVelocityMps: f.minFaceVelocityMps.default(0.5),
  openFaceAreaM2: f.openFaceAreaM2.default(null),
  // No spans means no restriction: a booth is bookable at any hour until its hours are set.
  openingHours: f.openingHours.default([]),
  sprayRateM2PerH: f.sprayRateM2PerH.default(20),
  // Left out, the booth goes to the creator's own site.
  siteId: f.siteId.optional(),
});
export type CreateBoothInput = z.input<typeof createBoothSchema>;

export const updateBoothSchema = boothFieldsSchema.partial();
export type UpdateBoothInput = z.infer<typeof updateBoothSchema>;

export const boothSchema = boothFieldsSchema.extend({
  id: z.number().int(),
  /** Minutes for the air to fall to 1 % (measured if set, otherwise the dilution purge equation). */
  clearanceMin: z.number(),
  clearanceSource: z.enum(['measured', 'computed']),
  /** Face velocity from extraction and open-face area, when the area is known. */
  faceVelocityMps: z.number().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Booth = z.infer<typeof boothSchema>;

export const boothResponseSchema = z.object({ booth: boothSchema });
export const boothListSchema = listSchema(boothSchema);
