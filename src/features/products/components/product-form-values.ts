import type { DefaultValues } from 'react-hook-form';
import type { z } from 'zod';
import type { DryingRow } from '../../../../shared/finishing/drying-row-schema';
import { productFieldsSchema, type createProductSchema, type Product } from '../../../../shared/schemas/product';

export type ProductFormInput = z.input<typeof createProductSchema>;
export type ProductFormOutput = z.output<typeof createProductSchema>;

/** Top-level names the server may put a field error on; anything else is shown above the form. */
export const productFieldNames = Object.keys(productFieldsSchema.shape);

type DryingRowDraft = Omit<DryingRow, 'recoatMaxMin'> & { recoatMaxMin: number | null };

/** A new row starts 10 °C below the coldest so far, with boxes left empty to be read off the sheet. */
export function newDryingRow(rows: Partial<DryingRowDraft>[]): DryingRowDraft {
  const temps = rows.map((row) => row.tempC).filter((t): t is number => typeof t === 'number' && Number.isFinite(t));
  const tempC = temps.length ? Math.min(...temps) - 10 : 20;
  const blank = undefined as unknown as number;
  return { tempC, flashOffMin: blank, recoatMinMin: blank, recoatMaxMin: null, touchDryMin: blank, handleMin: blank, packMin: blank, fullCureH: blank };
}

const newProduct: DefaultValues<ProductFormInput> = {
  name: '',
  makerRef: '',
  mixBaseParts: 1,
  mixHardenerParts: 0,
  thinnerMinPct: null,
  thinnerMaxPct: null,
  inductionMin: 0,
  potLifeMin: null,
  dryFilmPerCoatUm: null,
  densityKgPerL: null,
  referenceRhPct: null,
  minApplicationTempC: null,
  maxRelativeHumidityPct: null,
  vocGPerL: null,
  flashPointC: null,
  hazards: [],
  pricePerL: null,
  dryingTimes: [newDryingRow([])],
};

/** The form starts from the saved data sheet, field by field (ids, lots and files are not edited here). */
export function startingValues(product?: Product): DefaultValues<ProductFormInput> {
  if (!product) return newProduct;
  const values: Record<string, unknown> = {};
  for (const name of productFieldNames) values[name] = product[name as keyof Product];
  // A sheet with no thinning range shows blank boxes, so saving it again never turns it into 0–0 % ("do not thin").
  const thinning = product.thinningRangeGiven ? { thinnerMinPct: product.thinnerMinPct, thinnerMaxPct: product.thinnerMaxPct } : { thinnerMinPct: null, thinnerMaxPct: null };
  return { ...(values as DefaultValues<ProductFormInput>), ...thinning, dryingTimes: product.dryingTimes.map((row) => ({ ...row })), hazards: [...product.hazards] };
}

/** The request body: a blank thinning box is sent as null (no range given), never left out or sent as 0. */
export function toRequest(values: ProductFormOutput): ProductFormOutput {
  return { ...values, thinnerMinPct: values.thinnerMinPct ?? null, thinnerMaxPct: values.thinnerMaxPct ?? null };
}
