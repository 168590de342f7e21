import { evaluate } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { FinishingInputError } from '../../../shared/errors';
import {
  adjustDryingTimes,
  dryingRowSchema,
  scaleByTenDegreeRule,
  type DryingRow,
} from '../../../shared/finishing/drying-times';

const at20: DryingRow = {
  tempC: 20,
  flashOffMin: 15,
  recoatMinMin: 60,
  recoatMaxMin: 480,
  touchDryMin: 30,
  handleMin: 120,
  packMin: 480,
  fullCureH: 168,
};
const at10: DryingRow = { ...at20, tempC: 10, flashOffMin: 30, recoatMinMin: 150, recoatMaxMin: 1200, touchDryMin: 75, handleMin: 300, packMin: 1440, fullCureH: 336 };
const at30: DryingRow = { ...at20, tempC: 30, flashOffMin: 10, recoatMinMin: 30, recoatMaxMin: 240, touchDryMin: 15, handleMin: 60, packMin: 240, fullCureH: 96 };

describe('scaleByTenDegreeRule', () => {
  it('doubles a time 10 °C colder and halves it 10 °C warmer', () => {
    // Common practice, no primary source: the coatings site en1.nbchao.com (secondary) gives cure at 10 °C
    // about twice that at 20 °C and at 30 °C about half. Exact arithmetic, so float tolerance only.
    expect(scaleByTenDegreeRule(60, 20, 10)).toBeCloseTo(120, 10);
    expect(scaleByTenDegreeRule(60, 20, 30)).toBeCloseTo(30, 10);
    expect(scaleByTenDegreeRule(60, 20, 0)).toBeCloseTo(240, 10);
    expect(scaleByTenDegreeRule(60, 20, 20)).toBe(60);
  });

  it('is the Q10 = 2 form t_ref · 2^((T_ref − T)/10) between whole steps', () => {
    // Same rule evaluated independently by mathjs; 1e-9 relative tolerance for float rounding.
    const expected = evaluate('45 * 2 ^ ((23 - 14.5) / 10)') as number;
    expect(scaleByTenDegreeRule(45, 23, 14.5) / expected).toBeCloseTo(1, 9);
  });
});

describe('adjustDryingTimes with one data-sheet row', () => {
  it('scales every time by the 10 °C rule and says so', () => {
    const result = adjustDryingTimes([at20], 10);
    expect(result.method).toBe('single-row-rule');
    expect(result.times.flashOffMin).toBeCloseTo(30, 10);
    expect(result.times.recoatMaxMin).toBeCloseTo(960, 10);
    expect(result.times.fullCureH).toBeCloseTo(336, 10);
  });

  it('returns the row itself at its own temperature', () => {
    const result = adjustDryingTimes([at20], 20);
    expect(result.method).toBe('exact-row');
    const { tempC: _tempC, ...timesAt20 } = at20;
    expect(result.times).toEqual(timesAt20);
  });

  it('keeps a window that never closes open at any temperature', () => {
    expect(adjustDryingTimes([{ ...at20, recoatMaxMin: null }], 5).times.recoatMaxMin).toBeNull();
  });

  it('keeps a zero time at zero', () => {
    expect(adjustDryingTimes([{ ...at20, recoatMinMin: 0 }], 5).times.recoatMinMin).toBe(0);
  });
});

describe('adjustDryingTimes with several rows', () => {
  it('returns a row exactly at its temperature', () => {
    const result = adjustDryingTimes([at30, at10, at20], 10);
    expect(result.method).toBe('exact-row');
    expect(result.times.packMin).toBe(1440);
  });

  it('interpolates ln(time) linearly in temperature between rows', () => {
    // Independent evaluation with mathjs of exp(ln t1 + f·(ln t2 − ln t1)); 1e-9 relative for float rounding.
    const result = adjustDryingTimes([at10, at20, at30], 16);
    expect(result.method).toBe('interpolated');
    const expected = evaluate('exp(log(300) + 0.6 * (log(120) - log(300)))') as number;
    expect(result.times.handleMin / expected).toBeCloseTo(1, 9);
  });

  it('reproduces the 10 °C rule when the rows follow it', () => {
    // Rows that obey doubling per 10 °C must give 2^(−0.5) of the 10 °C time at 15 °C.
    const doubled: DryingRow = { ...at20, tempC: 10, flashOffMin: 30, recoatMinMin: 120, recoatMaxMin: 960, touchDryMin: 60, handleMin: 240, packMin: 960, fullCureH: 336 };
    const result = adjustDryingTimes([doubled, at20], 15);
    expect(result.times.recoatMinMin).toBeCloseTo(scaleByTenDegreeRule(60, 20, 15), 9);
    expect(result.times.fullCureH).toBeCloseTo(scaleByTenDegreeRule(168, 20, 15), 9);
  });

  it('stays within 1 % of an Arrhenius cure between rows 10 °C apart', () => {
    // Source: Arrhenius k = A·exp(−Ea/RT) (standard chemistry); check value 2 h at 20 °C with Ea 50 kJ/mol → 4.128 h at 10 °C.
    // Tolerance 1 %: ln(t) is linear in 1/T, not in T; over 10 K the bend is about 0.6 %.
    const arrhenius = (tempC: number) => evaluate(`2 h * exp((50000 / 8.314462618) * (1 / ${tempC + 273.15} - 1 / 293.15))`).toNumber('h');
    expect(Math.abs(arrhenius(10) - 4.128)).toBeLessThan(0.005); // ±0.005 h as the check value is rounded
    const rows = [{ ...at20, fullCureH: 2 }, { ...at10, fullCureH: arrhenius(10) }];
    const interpolated = adjustDryingTimes(rows, 15).times.fullCureH;
    expect(Math.abs(interpolated / arrhenius(15) - 1)).toBeLessThan(0.01);
  });

  it('extrapolates with the nearest pair of rows and warns', () => {
    const cold = adjustDryingTimes([at10, at20, at30], 5);
    expect(cold.method).toBe('extrapolated');
    // 10–20 °C segment: handle goes 300 → 120, so 5 °C is 300 · (300/120)^0.5.
    expect(cold.times.handleMin).toBeCloseTo(300 * (300 / 120) ** 0.5, 9);
    expect(cold.warnings.map((w) => w.code)).toContain('outside-data-sheet-temps');
    const warm = adjustDryingTimes([at10, at20, at30], 35);
    expect(warm.times.handleMin).toBeCloseTo(60 * (60 / 120) ** 0.5, 9);
  });

  it('blends a zero time linearly rather than through ln(0)', () => {
    const rows = [{ ...at10, flashOffMin: 10 }, { ...at20, flashOffMin: 0 }];
    expect(adjustDryingTimes(rows, 15).times.flashOffMin).toBeCloseTo(5, 10);
    expect(adjustDryingTimes(rows, 30).times.flashOffMin).toBe(0);
  });
});

describe('adjustDryingTimes warnings and input errors', () => {
  it('warns below the minimum application temperature, in the user’s units', () => {
    const result = adjustDryingTimes([at20], 8, { minApplicationTempC: 10, units: 'us' });
    const warning = result.warnings.find((w) => w.code === 'below-min-application-temp');
    expect(warning?.message).toContain('46.4 °F');
    expect(adjustDryingTimes([at20], 12, { minApplicationTempC: 10 }).warnings).toEqual([]);
  });

  it('names the field that is wrong', () => {
    expect(() => adjustDryingTimes([], 20)).toThrow(expect.objectContaining({ field: 'dryingTimes' }));
    expect(() => adjustDryingTimes([{ ...at20, flashOffMin: -1 }], 20)).toThrow(
      expect.objectContaining({ field: 'dryingTimes.0.flashOffMin' }),
    );
    expect(() => adjustDryingTimes([at20, { ...at10, tempC: 20 }], 20)).toThrow(
      expect.objectContaining({ field: 'dryingTimes.1.tempC' }),
    );
    expect(() => adjustDryingTimes([at20, { ...at10, recoatMaxMin: null }], 15)).toThrow(FinishingInputError);
    expect(() => adjustDryingTimes([at20], Number.NaN)).toThrow(expect.objectContaining({ field: 'tempC' }));
  });

  it('has a row schema that explains a closing time before the opening time', () => {
    const parsed = dryingRowSchema.safeParse({ ...at20, recoatMaxMin: 30 });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0].path).toEqual(['recoatMaxMin']);
  });
});
