import { z } from 'zod';
import { dryingTableSchema, type DryingRow } from '../finishing/drying-row-schema';
import { listSchema, optionalTextSchema, pageFields, requiredTextSchema } from './common';

export const productKinds = ['primer', 'sealer', 'undercoat', 'topcoat', 'stain', 'clear'] as const;
export const productKindSchema = z.enum(productKinds, { error: 'Choose what kind of product this is' });
export type ProductKind = z.infer<typeof productKindSchema>;

export const chemistries = ['water-borne', 'solvent-borne', 'acid-catalysed', 'two-component-polyurethane', 'two-component-acrylic', 'uv-cure'] as const;
export const chemistrySchema = z.enum(chemistries, { error: 'Choose the chemistry' });
export type Chemistry = z.infer<typeof chemistrySchema>;

export const chemistryLabels: Record<Chemistry, string> = {
  'water-borne': 'Water-borne',
  'solvent-borne': 'Solvent-borne',
  'acid-catalysed': 'Acid-catalysed',
  'two-component-polyurethane': '2K polyurethane',
  'two-component-acrylic': '2K acrylic',
  'uv-cure': 'UV-cure',
};

export const hazards = ['isocyanate', 'flammable', 'formaldehyde', 'sensitiser'] as const;
export const hazardSchema = z.enum(hazards, { error: 'Unknown hazard flag' });
export type Hazard = z.infer<typeof hazardSchema>;

export const hazardLabels: Record<Hazard, string> = {
  isocyanate: 'Contains isocyanate',
  flammable: 'Flammable',
  formaldehyde: 'Releases formaldehyde',
  sensitiser: 'Sensitiser',
};

const optionalNumber = (schema: z.ZodNumber) => schema.nullable();

/**
 * A colder row may not dry faster than a warmer one: a data sheet whose times shrink as the
 * temperature falls has been typed in wrongly. Reported on the colder row's field.
 */
export function timesShrinkingWithCold(rows: DryingRow[]): { index: number; field: keyof DryingRow } | null {
  const byTemp = rows.map((row, index) => ({ row, index })).sort((a, b) => a.row.tempC - b.row.tempC);
  const fields = ['flashOffMin', 'recoatMinMin', 'recoatMaxMin', 'touchDryMin', 'handleMin', 'packMin', 'fullCureH'] as const;
  for (let i = 0; i + 1 < byTemp.length; i++) {
    const colder = byTemp[i];
    const warmer = byTemp[i + 1];
    const field = fields.find((f) => (colder.row[f] ?? Infinity) < (warmer.row[f] ?? Infinity));
    if (field) return { index: colder.index, field };
  }
  return null;
}

// Kept free of defaults: a PATCH must never reset a field the caller did not send.
export const productFieldsSchema = z.object({
  name: requiredTextSchema('Enter the product name', 120),
  makerRef: optionalTextSchema(80),
  kind: productKindSchema,
  chemistry: chemistrySchema,
  volumeSolidsPct: z.number({ error: 'Enter the volume solids in %' }).min(1, 'Volume solids must be between 1 and 100 %').max(100, 'Volume solids must be between 1 and 100 %'),
  densityKgPerL: optionalNumber(z.number().positive('Density must be more than 0').max(5)),
  mixBaseParts: z.number().positive('Base parts must be more than 0').max(100),
  /** 0 for a one-component product. */
  mixHardenerParts: z.number().min(0, 'Hardener parts cannot be negative').max(100),
  /** The data sheet's thinning range; null when it gives none (then thinning is not checked). 0–0 means "do not thin". */
  thinnerMinPct: z.number().min(0).max(100).nullable(),
  thinnerMaxPct: z.number().min(0).max(100).nullable(),
  inductionMin: z.number().min(0).max(240),
  potLifeMin: optionalNumber(z.number().positive('Pot life must be more than 0').max(7 * 24 * 60)),
  dryFilmPerCoatUm: optionalNumber(z.number().positive('Dry film must be more than 0').max(1000)),
  referenceRhPct: optionalNumber(z.number().min(0).max(100)),
  minApplicationTempC: optionalNumber(z.number().min(-10).max(60)),
  maxRelativeHumidityPct: optionalNumber(z.number().min(1, 'Give RH as a percentage').max(100, 'RH cannot be over 100 %')),
  vocGPerL: optionalNumber(z.number().min(0, 'VOC cannot be negative').max(1500)),
  flashPointC: optionalNumber(z.number().min(-50).max(400)),
  hazards: z.array(hazardSchema).max(hazards.length),
  pricePerL: optionalNumber(z.number().min(0, 'Price cannot be negative').max(100000)),
  dryingTimes: dryingTableSchema,
});

type ProductChecks = Partial<z.infer<typeof productFieldsSchema>>;

function checkProduct(product: ProductChecks, ctx: z.RefinementCtx): void {
  const { thinnerMinPct: least, thinnerMaxPct: most } = product;
  if (typeof least === 'number' && most === null) {
    ctx.addIssue({ code: 'custom', message: 'Give the most thinner too, or leave both blank if the data sheet gives no range', path: ['thinnerMaxPct'] });
  }
  if (typeof least === 'number' && typeof most === 'number' && most < least) {
    ctx.addIssue({ code: 'custom', message: 'The most thinner cannot be less than the least', path: ['thinnerMaxPct'] });
  }
  const shrinking = product.dryingTimes ? timesShrinkingWithCold(product.dryingTimes) : null;
  if (shrinking) {
    ctx.addIssue({ code: 'custom', message: 'This time is shorter than at a warmer temperature; colder must not dry faster', path: ['dryingTimes', shrinking.index, shrinking.field] });
  }
}

const f = productFieldsSchema.shape;
export const createProductSchema = productFieldsSchema
  .extend({
    makerRef: f.makerRef.default(''),
    densityKgPerL: f.densityKgPerL.default(null),
    mixBaseParts: f.mixBaseParts.default(1),
    mixHardenerParts: f.mixHardenerParts.default(0),
    thinnerMinPct: f.thinnerMinPct.default(null),
    thinnerMaxPct: f.thinnerMaxPct.default(null),
    inductionMin: f.inductionMin.default(0),
    potLifeMin: f.potLifeMin.default(null),
    dryFilmPerCoatUm: f.dryFilmPerCoatUm.default(null),
    referenceRhPct: f.referenceRhPct.default(null),
    minApplicationTempC: f.minApplicationTempC.default(null),
    maxRelativeHumidityPct: f.maxRelativeHumidityPct.default(null),
    vocGPerL: f.vocGPerL.default(null),
    flashPointC: f.flashPointC.default(null),
    hazards: f.hazards.default([]),
    pricePerL: f.pricePerL.default(null),
  })
  .superRefine(checkProduct);
export type CreateProductInput = z.input<typeof createProductSchema>;

export const updateProductSchema = productFieldsSchema.partial().superRefine(checkProduct);

/** The thinning range as stored: a missing least is 0; no range at all is 0–0, not given. */
export function storedThinning(fields: { thinnerMinPct: number | null; thinnerMaxPct: number | null }): { thinnerMinPct: number; thinnerMaxPct: number; thinningRangeGiven: boolean } {
  if (fields.thinnerMaxPct === null) return { thinnerMinPct: 0, thinnerMaxPct: 0, thinningRangeGiven: false };
  return { thinnerMinPct: fields.thinnerMinPct ?? 0, thinnerMaxPct: fields.thinnerMaxPct, thinningRangeGiven: true };
}
export type UpdateProductInput = z.infer<typeof updateProductSchema>;

export const lotSchema = z.object({
  id: z.number().int(),
  productId: z.number().int(),
  lotNumber: z.string(),
  expiresOn: z.string().nullable(),
  /** Worked out on the server against today's date in the shop's timezone. */
  expired: z.boolean(),
  createdAt: z.string(),
});
export type Lot = z.infer<typeof lotSchema>;

const isoDate = z.iso.date({ error: 'Use a date like 2027-03-31' });
export const createLotSchema = z.object({
  lotNumber: requiredTextSchema('Enter the lot number', 60),
  expiresOn: isoDate.nullable().default(null),
});
export type CreateLotInput = z.input<typeof createLotSchema>;

export const fileRefSchema = z.object({ id: z.number().int(), originalName: z.string(), sizeBytes: z.number().int(), uploadedAt: z.string() });
export type FileRef = z.infer<typeof fileRefSchema>;
export const documentKinds = ['tds', 'sds'] as const;
export const documentKindSchema = z.enum(documentKinds, { error: 'Say whether this is the technical or the safety data sheet' });

export const productSchema = productFieldsSchema.extend({
  /** 0 when the data sheet gives no range (see thinningRangeGiven), as before that flag existed. */
  thinnerMinPct: z.number(),
  thinnerMaxPct: z.number(),
  /** False when the data sheet gives no thinning range: thinning is then not checked. */
  thinningRangeGiven: z.boolean(),
  id: z.number().int(),
  lots: z.array(lotSchema),
  tdsFile: fileRefSchema.nullable(),
  sdsFile: fileRefSchema.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Product = z.infer<typeof productSchema>;
export const productListSchema = listSchema(productSchema);

export const productSortFields = ['name', 'kind', 'chemistry', 'updatedAt'] as const;
export const productListQuerySchema = z.object({
  q: z.string().trim().max(80).optional(),
  sort: z.enum(productSortFields).default('name'),
  dir: z.enum(['asc', 'desc']).default('asc'),
  ...pageFields(25, 200),
});
export type ProductListQuery = z.infer<typeof productListQuerySchema>;

export const productResponseSchema = z.object({ product: productSchema });
export const lotResponseSchema = z.object({ lot: lotSchema });
