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
  thinnerMinPct: 0,
  thinnerMaxPct: 0,
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
  return { ...(values as DefaultValues<ProductFormInput>), dryingTimes: product.dryingTimes.map((row) => ({ ...row })), hazards: [...product.hazards] };
}
