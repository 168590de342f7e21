import { describe, expect, it } from 'vitest';
import { FinishingInputError } from '../../../shared/errors';
import type { DryingRow } from '../../../shared/finishing/drying-times';
import { defaultAbradeMin, shortestTimeThroughSystem, type ProductDryingTable, type SystemTimeStep } from '../../../shared/finishing/system-time';

const row = (tempC: number, recoatMinMin: number, packMin: number): DryingRow => ({
  tempC,
  flashOffMin: 10,
  recoatMinMin,
  recoatMaxMin: null,
  touchDryMin: 20,
  handleMin: packMin / 2,
  packMin,
  fullCureH: 168,
});

// Invented products. The sealer's table has two rows; the topcoat's only one (so the 10 °C rule applies).
const sealerId = 1;
const topcoatId = 2;
const tables = new Map<number, ProductDryingTable>([
  [sealerId, { dryingTimes: [row(20, 60, 480), row(10, 240, 1920)], minApplicationTempC: 5 }],
  [topcoatId, { dryingTimes: [row(20, 90, 600)], minApplicationTempC: 12 }],
]);

const sealerAbradeTwoTopcoats: SystemTimeStep[] = [
  { kind: 'coat', productId: sealerId },
  { kind: 'abrade', grit: 'P320' },
  { kind: 'coat', productId: topcoatId },
  { kind: 'coat', productId: topcoatId },
];

describe('shortestTimeThroughSystem', () => {
  it('adds recoat-open times, the abrade minutes and the last coat’s pack time (hand-worked at 10 °C)', () => {
    // Hand-worked, no library:
    //   sealer at 10 °C is its own 10 °C row (exact):    recoat opens after 240 min
    //   abrade P320, common practice (no published source):               15 min
    //   topcoat, one row at 20 °C, 10 °C rule ×2^((20−10)/10) = ×2: recoat 90 × 2 = 180 min
    //   last topcoat, pack 600 × 2:                                      1200 min
    //   total 240 + 15 + 180 + 1200 = 1635 min
    const result = shortestTimeThroughSystem(sealerAbradeTwoTopcoats, tables, 10);
    expect(result.perStep.map((s) => [s.waitsFor, s.method])).toEqual([
      ['recoat-opens', 'exact-row'],
      ['abrade', null],
      ['recoat-opens', 'single-row-rule'],
      ['pack', 'single-row-rule'],
    ]);
    expect(result.perStep.map((s) => s.minutes)).toEqual([240, 15, 180, 1200]);
    expect(result.totalMin).toBe(1635);
  });

  it('interpolates between rows and scales one-row tables at 15 °C (hand-worked)', () => {
    // Hand-worked:
    //   sealer between 20 °C (60) and 10 °C (240), ln-linear at the midpoint: √(60 × 240) = 120 min
    //   abrade: 15 min (common practice, no published source)
    //   topcoat 90 × 2^0.5 = 127.279 min; last topcoat pack 600 × 2^0.5 = 848.528 min
    //   total 120 + 15 + 127.279 + 848.528 = 1110.807 min
    const result = shortestTimeThroughSystem(sealerAbradeTwoTopcoats, tables, 15);
    expect(result.perStep[0].method).toBe('interpolated');
    expect(result.perStep[0].minutes).toBeCloseTo(120, 9);
    expect(result.perStep[2].minutes).toBeCloseTo(127.279, 3);
    expect(result.perStep[3].minutes).toBeCloseTo(848.528, 3);
    expect(result.totalMin).toBeCloseTo(1110.807, 3);
  });

  it('takes the abrade minutes from the caller, 15 by default', () => {
    expect(defaultAbradeMin).toBe(15);
    const result = shortestTimeThroughSystem(sealerAbradeTwoTopcoats, tables, 10, { abradeMin: 30 });
    expect(result.totalMin).toBe(1635 - 15 + 30);
  });

  it('counts only the pack time for a one-coat system', () => {
    // Sealer alone at 20 °C: its own row's pack time, 480 min.
    const result = shortestTimeThroughSystem([{ kind: 'coat', productId: sealerId }], tables, 20);
    expect(result.totalMin).toBe(480);
    expect(result.perStep[0].waitsFor).toBe('pack');
  });

  it('leaves out a denib before the first coat or after the last, which are outside "first coat to packed"', () => {
    const steps: SystemTimeStep[] = [{ kind: 'abrade', grit: 'P180' }, { kind: 'coat', productId: sealerId }, { kind: 'abrade', grit: 'P400' }];
    const result = shortestTimeThroughSystem(steps, tables, 20);
    expect(result.perStep.map((s) => s.waitsFor)).toEqual(['not-counted', 'pack', 'not-counted']);
    expect(result.totalMin).toBe(480);
  });

  it('passes on the drying warnings once, e.g. a temperature below a product’s minimum', () => {
    // 10 °C is below the topcoat's 12 °C minimum; two topcoat steps must give one warning, not two.
    const result = shortestTimeThroughSystem(sealerAbradeTwoTopcoats, tables, 10);
    expect(result.warnings.map((w) => w.code)).toEqual(['below-min-application-temp']);
    expect(shortestTimeThroughSystem(sealerAbradeTwoTopcoats, tables, 20).warnings).toEqual([]);
  });

  it('refuses a system without a coat, a product with no drying table and a negative abrade time', () => {
    expect(() => shortestTimeThroughSystem([{ kind: 'abrade' }], tables, 20)).toThrow(FinishingInputError);
    expect(() => shortestTimeThroughSystem([{ kind: 'coat', productId: 99 }], tables, 20)).toThrow(/drying times are not known/);
    expect(() => shortestTimeThroughSystem(sealerAbradeTwoTopcoats, tables, 20, { abradeMin: -1 })).toThrow(FinishingInputError);
  });
});
