import { describe, expect, it } from 'vitest';
import { computeCoatRecord, type CoatRecordInput } from '../../../shared/finishing/coat-record';

const product: CoatRecordInput['product'] = {
  volumeSolidsPct: 40,
  dryingTimes: [{ tempC: 20, flashOffMin: 10, recoatMinMin: 60, recoatMaxMin: null, touchDryMin: 20, handleMin: 90, packMin: 300, fullCureH: 168 }],
  minApplicationTempC: null,
  maxRelativeHumidityPct: null,
  thinnerMinPct: 0,
  thinnerMaxPct: 0,
  thinningRangeGiven: false,
  dryFilmPerCoatUm: null,
};

// Air 20 °C, 50 % RH, surface 19 °C: about 10 °C above the dew point, so no condition comes into it.
const coat = (changes: Partial<CoatRecordInput> = {}, sheet: Partial<CoatRecordInput['product']> = {}) =>
  computeCoatRecord({
    product: { ...product, ...sheet },
    sprayedAt: new Date('2027-03-01T09:00:00Z'),
    airTempC: 20,
    relativeHumidityPct: 50,
    surfaceTempC: 19,
    dryingTempC: 20,
    thinningPct: 10,
    wetFilmUm: null,
    targetDryFilmUm: null,
    lotExpired: false,
    previousWindow: null,
    ...changes,
  });
const codes = (record: ReturnType<typeof coat>) => record.warnings.map((w) => w.code);

describe('computeCoatRecord thinning check', () => {
  // The range is the data sheet's own; with none given there is nothing to check against.
  it('does not check thinning when the data sheet gives no range', () => {
    expect(codes(coat({ thinningPct: 10 }))).toEqual([]);
    expect(codes(coat({ thinningPct: 0 }))).toEqual([]);
  });

  it('checks against a given range, 0–0 % ("do not thin") included', () => {
    expect(codes(coat({ thinningPct: 10 }, { thinningRangeGiven: true }))).toEqual(['thinning-outside-range']);
    expect(codes(coat({ thinningPct: 0 }, { thinningRangeGiven: true }))).toEqual([]);
    expect(codes(coat({ thinningPct: 10 }, { thinningRangeGiven: true, thinnerMinPct: 5, thinnerMaxPct: 15 }))).toEqual([]);
    const over = coat({ thinningPct: 20 }, { thinningRangeGiven: true, thinnerMinPct: 5, thinnerMaxPct: 15 });
    expect(over.warnings[0].message).toBe('Thinning 20 % is outside the data sheet’s 5–15 %.');
  });
});
