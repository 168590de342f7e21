import { z } from 'zod';
import { listSchema, maxId, optionalTextSchema, pageFields, requiredTextSchema } from './common';

export const partFaces = ['one', 'both'] as const;
export const partFacesSchema = z.enum(partFaces, { error: 'Faces is one or both' });

const mm = (what: string) => z.number({ error: `Enter the ${what} in mm` }).positive(`The ${what} must be more than 0`).max(10000, `The ${what} looks too big for mm`);

export const partFieldsSchema = z.object({
  label: requiredTextSchema('Enter a label', 80),
  kind: optionalTextSchema(40),
  lengthMm: mm('length'),
  widthMm: mm('width'),
  thicknessMm: z.number({ error: 'Enter the thickness in mm' }).positive('The thickness must be more than 0').max(500, 'The thickness looks too big for mm'),
  quantity: z.number({ error: 'Enter the quantity as a whole number' }).int('Whole pieces only').min(1, 'At least one piece').max(10000),
  faces: partFacesSchema,
  edges: z.boolean({ error: 'Say whether the edges are coated: yes or no' }),
  rackId: z.number().int().positive().nullable(),
  shelf: z.number().int().min(1, 'Shelves count from 1').nullable(),
});

const f = partFieldsSchema.shape;
export const createPartSchema = partFieldsSchema.extend({
  kind: f.kind.default(''),
  quantity: f.quantity.default(1),
  faces: f.faces.default('both'),
  edges: f.edges.default(true),
  rackId: f.rackId.default(null),
  shelf: f.shelf.default(null),
});
export type CreatePartInput = z.input<typeof createPartSchema>;
export const updatePartSchema = partFieldsSchema.partial();
export type UpdatePartInput = z.infer<typeof updatePartSchema>;

export const partSchema = partFieldsSchema.extend({
  id: z.number().int(),
  jobId: z.number().int(),
  /** Area coated on one piece and on all of them (see shared/finishing/area.ts for the rule). */
  pieceAreaM2: z.number(),
  coatedAreaM2: z.number(),
  tag: z.string(),
  state: z.string(),
  rackName: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Part = z.infer<typeof partSchema>;

export const importRowErrorSchema = z.object({ row: z.number().int(), field: z.string(), message: z.string() });
export type ImportRowError = z.infer<typeof importRowErrorSchema>;

/** Maps our part fields to the CSV's own header names; omitted fields use our header names. */
export const importMappingSchema = z.record(z.string(), z.string()).default({});

export const importResultSchema = z.object({
  saved: z.boolean(),
  rowCount: z.number().int(),
  /** Rows as read: a bad row comes back as the file had it, so the person can see what to fix. */
  preview: z.array(z.object({ row: z.number().int() }).catchall(z.unknown())),
  errors: z.array(importRowErrorSchema),
  headers: z.array(z.string()),
  items: z.array(partSchema),
});
export type ImportResult = z.infer<typeof importResultSchema>;

export const csvTemplateHeaders = ['label', 'kind', 'lengthMm', 'widthMm', 'thicknessMm', 'quantity', 'faces', 'edges'] as const;

/** A job's parts come in large pages: a kitchen is a few hundred parts, and the tag sheet prints them all. */
export const partListQuerySchema = z.object({
  ...pageFields(500, 1000),
});

export const partResponseSchema = z.object({ part: partSchema });
export const partListSchema = listSchema(partSchema);

/** Most parts one `?ids=` asks for: a spray session plans tens of parts, a large one a few hundred. */
export const maxPartIds = 500;

/** `?ids=3,5,8`: part ids in plain digits, separated by commas; a repeated id is read once. */
export const partIdsQuerySchema = z.object({
  ids: z
    .string({ error: 'Give the part ids, separated by commas' })
    .regex(/^[1-9][0-9]{0,9}(,[1-9][0-9]{0,9})*$/, 'Give part ids as whole numbers in plain digits, separated by commas')
    .transform((text) => [...new Set(text.split(',').map(Number))])
    .pipe(z.array(z.number().max(maxId, 'No record has an id that large')).max(maxPartIds, `At most ${maxPartIds} parts at once`)),
});
