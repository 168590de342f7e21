import { describe, expect, it } from 'vitest';
import { createProductSchema, type Product } from '../../../../shared/schemas/product';
import { thinningRangeWords } from '../../../../shared/words';
import { startingValues, toRequest } from '../../../../src/features/products/components/product-form-values';

const sheet = (thinning: Pick<Product, 'thinnerMinPct' | 'thinnerMaxPct' | 'thinningRangeGiven'>): Product => ({
  id: 7,
  name: 'Kestrel Precat Clear Matt',
  makerRef: 'KPC-M',
  kind: 'clear',
  chemistry: 'acid-catalysed',
  volumeSolidsPct: 28,
  densityKgPerL: null,
  mixBaseParts: 1,
  mixHardenerParts: 0,
  ...thinning,
  inductionMin: 0,
  potLifeMin: null,
  dryFilmPerCoatUm: 25,
  referenceRhPct: null,
  minApplicationTempC: 15,
  maxRelativeHumidityPct: 80,
  vocGPerL: null,
  flashPointC: null,
  hazards: [],
  pricePerL: null,
  dryingTimes: [{ tempC: 20, flashOffMin: 10, recoatMinMin: 30, recoatMaxMin: null, touchDryMin: 15, handleMin: 60, packMin: 240, fullCureH: 168 }],
  lots: [],
  tdsFile: null,
  sdsFile: null,
  createdAt: '2027-01-01T00:00:00.000Z',
  updatedAt: '2027-01-01T00:00:00.000Z',
});

/** What the form sends when it is saved without touching a box. */
const savedUntouched = (product?: Product) => toRequest(createProductSchema.parse(startingValues(product)));

describe('the data sheet form and its thinning range', () => {
  it('shows blank thinning boxes for a sheet with no range given, and saving it again sends null, not 0–0 %', () => {
    const product = sheet({ thinnerMinPct: 0, thinnerMaxPct: 0, thinningRangeGiven: false });
    const values = startingValues(product);
    expect([values.thinnerMinPct, values.thinnerMaxPct]).toEqual([null, null]);
    const body = savedUntouched(product);
    expect([body.thinnerMinPct, body.thinnerMaxPct]).toEqual([null, null]);
  });

  it('keeps a given range, including 0–0 % which means "do not thin"', () => {
    expect(savedUntouched(sheet({ thinnerMinPct: 5, thinnerMaxPct: 10, thinningRangeGiven: true }))).toMatchObject({ thinnerMinPct: 5, thinnerMaxPct: 10 });
    expect(savedUntouched(sheet({ thinnerMinPct: 0, thinnerMaxPct: 0, thinningRangeGiven: true }))).toMatchObject({ thinnerMinPct: 0, thinnerMaxPct: 0 });
  });

  it('starts a new sheet with no range given', () => {
    const values = startingValues();
    expect([values.thinnerMinPct, values.thinnerMaxPct]).toEqual([null, null]);
  });

  it('sends a box the schema left out as null', () => {
    const parsed = createProductSchema.parse(startingValues(sheet({ thinnerMinPct: 5, thinnerMaxPct: 10, thinningRangeGiven: true })));
    const body = toRequest({ ...parsed, thinnerMinPct: undefined as unknown as null, thinnerMaxPct: undefined as unknown as null });
    expect('thinnerMinPct' in body && 'thinnerMaxPct' in body).toBe(true);
    expect(body).toMatchObject({ thinnerMinPct: null, thinnerMaxPct: null });
  });

  it('says so in words when no range is given, rather than 0–0 %', () => {
    expect(thinningRangeWords(sheet({ thinnerMinPct: 0, thinnerMaxPct: 0, thinningRangeGiven: false }))).toBe('no thinning range given');
    expect(thinningRangeWords(sheet({ thinnerMinPct: 0, thinnerMaxPct: 0, thinningRangeGiven: true }))).toBe('do not thin');
    expect(thinningRangeWords(sheet({ thinnerMinPct: 5, thinnerMaxPct: 10, thinningRangeGiven: true }))).toBe('5–10 %');
  });
});
