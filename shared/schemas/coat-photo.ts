import { z } from 'zod';
import { optionalTextSchema } from './common';

export const photoSubjects = ['defect', 'sample-board', 'finish', 'other'] as const;
export type PhotoSubject = (typeof photoSubjects)[number];
export const photoSubjectLabels: Record<PhotoSubject, string> = {
  defect: 'A defect',
  'sample-board': 'Sample board',
  finish: 'The finish as sprayed',
  other: 'Other',
};

/** The text fields sent with a photo (multipart form). */
export const addCoatPhotoFieldsSchema = z.object({
  subject: z.enum(photoSubjects, { error: 'Say what the photo shows' }).default('finish'),
  caption: optionalTextSchema(300, 'At most 300 characters').default(''),
});
export type AddCoatPhotoFields = z.input<typeof addCoatPhotoFieldsSchema>;

export const coatPhotoSchema = z.object({
  id: z.number().int(),
  /** The coat version the photo was taken with. */
  coatId: z.number().int(),
  /** The coat asked about: the same, or a later version that corrects it. */
  shownWithCoatId: z.number().int(),
  subject: z.enum(photoSubjects),
  caption: z.string(),
  mimeType: z.string(),
  sizeBytes: z.number().int(),
  takenByName: z.string(),
  takenAt: z.string(),
  /** Where the image itself is read (signed in, same site). */
  url: z.string(),
});
export type CoatPhoto = z.infer<typeof coatPhotoSchema>;

/** `?coatIds=12,13,14`: the coats on one page of the log. */
export const coatPhotoQuerySchema = z.object({
  coatIds: z
    .string({ error: 'Name the coats, e.g. coatIds=12,13' })
    .regex(/^[1-9][0-9]{0,9}(,[1-9][0-9]{0,9}){0,99}$/, 'Coat ids in plain digits, separated by commas (at most 100)')
    .transform((text) => [...new Set(text.split(',').map(Number))])
    .pipe(z.array(z.number().max(2_147_483_647, 'No record has an id that large'))),
});

export const coatPhotoResponseSchema = z.object({ photo: coatPhotoSchema });
export const coatPhotoListSchema = z.object({ items: z.array(coatPhotoSchema) });
