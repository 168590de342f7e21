import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  dryFilmUm,
  filmTolerancePct,
  filmVerdict,
  theoreticalSpreadingRateM2PerL,
  thinnedVolumeSolidsPct,
  wetFilmTargetUm,
} from '../../../shared/finishing/film';

const milToUm = (mil: number) => unit(mil, 'mil').toNumber('um');
const umToMil = (um: number) => unit(um, 'um').toNumber('mil');

describe('wetFilmTargetUm', () => {
  it('asks for 176 µm wet to reach 125 µm dry at 71 % volume solids', () => {
    // Source: coatings maker's Tech Note 5.3 "Handy calculations" (published 176 µm; ±0.5 µm for its rounding).
    expect(Math.abs(wetFilmTargetUm({ dryFilmUm: 125, volumeSolidsPct: 71 }) - 176)).toBeLessThan(0.5);
  });

  it('asks for 3.57 mil wet to reach 1.5 mil dry at 42 % volume solids', () => {
    // Source: Ron Joseph, PCRC "Converting DFT to WFT" (Oct 2003), 3.57 mil; ±0.005 mil for its rounding. mil↔µm by mathjs.
    const wetUm = wetFilmTargetUm({ dryFilmUm: milToUm(1.5), volumeSolidsPct: 42 });
    expect(Math.abs(umToMil(wetUm) - 3.57)).toBeLessThan(0.005);
  });

  it('asks for 125 µm wet for 50 µm dry at 40 %', () => {
    // Source: the published relation WFT = DFT × 100 / VS (Tech Note 5.3); exact arithmetic.
    expect(wetFilmTargetUm({ dryFilmUm: 50, volumeSolidsPct: 40 })).toBeCloseTo(125, 10);
  });

  it('adds the thinner to the wet film: WFT = DFT × (100 + t) / VS', () => {
    // Source: Tech Note 5.3 thinned form. 50 µm at 40 % with 20 % thinner → 150 µm; exact arithmetic.
    expect(wetFilmTargetUm({ dryFilmUm: 50, volumeSolidsPct: 40, thinningPct: 20 })).toBeCloseTo(150, 10);
  });
});

describe('thinnedVolumeSolidsPct', () => {
  it('turns 60 % solids with 25 % thinner into 48 %', () => {
    // Source: strandsindustrialcoatings.com (1 gal of 60 % VS + 1 quart thinner → 48 %); exact.
    expect(thinnedVolumeSolidsPct({ volumeSolidsPct: 60, thinningPct: 25 })).toBeCloseTo(48, 10);
  });
});

describe('dryFilmUm', () => {
  it('reads a comb gauge back to dry film, with and without thinner', () => {
    // Source: Tech Note 5.3, DFT = WFT × VS / (100 + t). 176.06 µm at 71 % → 125 µm; 150 µm at 40 % + 20 % → 50 µm.
    expect(dryFilmUm({ wetFilmUm: (125 * 100) / 71, volumeSolidsPct: 71 })).toBeCloseTo(125, 10);
    expect(dryFilmUm({ wetFilmUm: 150, volumeSolidsPct: 40, thinningPct: 20 })).toBeCloseTo(50, 10);
  });

  it('refuses a negative film or zero solids, naming the field', () => {
    expect(() => dryFilmUm({ wetFilmUm: -5, volumeSolidsPct: 40 })).toThrow(expect.objectContaining({ field: 'wetFilmUm' }));
    expect(() => dryFilmUm({ wetFilmUm: 100, volumeSolidsPct: 0 })).toThrow(expect.objectContaining({ field: 'volumeSolidsPct' }));
    expect(() => dryFilmUm({ wetFilmUm: 100, volumeSolidsPct: 40, thinningPct: -1 })).toThrow(
      expect.objectContaining({ field: 'thinningPct' }),
    );
  });
});

describe('theoreticalSpreadingRateM2PerL', () => {
  it('gives 5.68 m²/L at 125 µm and 71 %', () => {
    // Source: Tech Note 5.3 and askvity.info (5.68 / about 5.7 m²/L); ±0.005 for the published rounding.
    expect(Math.abs(theoreticalSpreadingRateM2PerL({ volumeSolidsPct: 71, dryFilmUm: 125 }) - 5.68)).toBeLessThan(0.005);
  });

  it('gives 8 m²/L at 50 µm and 40 %', () => {
    // Source: TSR = VS × 10 / DFT (Tech Note 5.3); exact.
    expect(theoreticalSpreadingRateM2PerL({ volumeSolidsPct: 40, dryFilmUm: 50 })).toBeCloseTo(8, 10);
  });

  it('matches 1604 ft²/US gal per mil at 100 % solids', () => {
    // Source: 231 in³ per US gallon spread 0.001 in thick = 1604.17 ft² (definition of the US gallon); mathjs converts.
    const m2PerL = theoreticalSpreadingRateM2PerL({ volumeSolidsPct: 100, dryFilmUm: milToUm(1) });
    const ft2PerGal = unit(m2PerL, 'm^2/L').toNumber('ft^2/gal');
    expect(Math.abs(ft2PerGal - 1604.17)).toBeLessThan(0.01);
  });
});

describe('filmVerdict', () => {
  it('calls a film within the common ±20 % band on target', () => {
    // Tolerance: common practice, ±20 % of the target (value from memory; no wood-finishing standard found).
    expect(filmTolerancePct).toBe(20);
    expect(filmVerdict(80, 100)).toBe('on-target');
    expect(filmVerdict(120, 100)).toBe('on-target');
    expect(filmVerdict(79, 100)).toBe('thin');
    expect(filmVerdict(121, 100)).toBe('heavy');
  });

  it('honours a tighter tolerance from a data sheet', () => {
    expect(filmVerdict(91, 100, 10)).toBe('on-target');
    expect(filmVerdict(89, 100, 10)).toBe('thin');
  });
});
