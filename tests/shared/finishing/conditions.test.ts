import { unit } from 'mathjs';
import psychrolib from 'psychrolib';
import { beforeAll, describe, expect, it } from 'vitest';
import { FinishingInputError } from '../../../shared/errors';
import { assessConditions, dewPointC, surfaceMarginWords } from '../../../shared/finishing/conditions';

const fToC = (f: number) => unit(f, 'degF').toNumber('degC');
const cToF = (c: number) => unit(c, 'degC').toNumber('degF');

describe('dewPointC', () => {
  beforeAll(() => psychrolib.SetUnitSystem(psychrolib.SI));

  it('agrees with PsychroLib over a grid of shop conditions', () => {
    // Source: PsychroLib 2.5.0 (ASHRAE Handbook Fundamentals 2017 ch. 1, Hyland–Wexler), npm psychrolib 1.1.1.
    // Tolerance 0.05 °C: Magnus with Alduchov–Eskridge coefficients is a fit to the same saturation curve
    // (largest gap seen over this grid is about 0.03 °C) and PsychroLib solves to 0.001 °C.
    // PsychroLib switches to a frost point below 0 °C, so only dew points above 0.5 °C are compared.
    let compared = 0;
    for (let airC = 0; airC <= 40; airC += 2) {
      for (let rh = 20; rh <= 100; rh += 5) {
        const reference = psychrolib.GetTDewPointFromRelHum(airC, rh / 100);
        if (reference <= 0.5) continue;
        expect(Math.abs(dewPointC(airC, rh) - reference)).toBeLessThan(0.05);
        compared += 1;
      }
    }
    expect(compared).toBeGreaterThan(250);
  });

  it('gives 20 °C at 30 °C and 55 %', () => {
    // Source: Dörken coatings glossary, "Dew point" (published to the whole degree; ±0.1 °C).
    expect(Math.abs(dewPointC(30, 55) - 20)).toBeLessThan(0.1);
  });

  it('gives 21.3094 °C at 25 °C and 80 %', () => {
    // Source: PsychroLib JS docstring example. ±0.01 °C: different saturation formula, same air.
    expect(Math.abs(dewPointC(25, 80) - 21.3094)).toBeLessThan(0.01);
  });

  it('gives 0.0479 °C at 10 °C and 50 %', () => {
    // Source: MetPy dewpoint_from_relative_humidity docs example (Bolton coefficients; ±0.1 °C for the coefficient set).
    expect(Math.abs(dewPointC(10, 50) - 0.0479)).toBeLessThan(0.1);
  });

  it('gives 42.8 °F at 68 °F and 40 %', () => {
    // Source: Viega design manual, psychrometric chart figure 3-5 (read to 0.1 °F; ±0.1 °F). Conversions by mathjs.
    expect(Math.abs(cToF(dewPointC(fToC(68), 40)) - 42.8)).toBeLessThan(0.1);
  });

  it('gives about 11 °C at 16 °C and 71 %', () => {
    // Source: "Ambient Application Conditions" coating guide, read off a chart (±0.5 °C for chart reading).
    expect(Math.abs(dewPointC(16, 71) - 11)).toBeLessThan(0.5);
  });

  it('equals the air temperature at 100 %', () => {
    // Identity: saturated air is at its own dew point. Tolerance is float rounding only.
    for (const airC of [-10, 0, 12.5, 20, 35]) expect(Math.abs(dewPointC(airC, 100) - airC)).toBeLessThan(1e-9);
  });

  it('is close to the quick rule Td ≈ T − (100 − RH)/5 at 20 °C and 80 %', () => {
    // Source: Lawrence (2005) BAMS 86(2) 225–233, stated good to about 1 °C above 50 % RH.
    expect(Math.abs(dewPointC(20, 80) - (20 - (100 - 80) / 5))).toBeLessThan(1);
  });

  it('refuses humidity of 0 or over 100 %, naming the field', () => {
    expect(() => dewPointC(20, 0)).toThrow(FinishingInputError);
    expect(() => dewPointC(20, 101)).toThrow(expect.objectContaining({ field: 'relativeHumidityPct' }));
    expect(() => dewPointC(Number.NaN, 50)).toThrow(expect.objectContaining({ field: 'airTempC' }));
  });
});

describe('assessConditions', () => {
  const at = (surfaceTempC: number, extra: Partial<Parameters<typeof assessConditions>[0]> = {}) =>
    assessConditions({ airTempC: 20, relativeHumidityPct: 60, surfaceTempC, ...extra });
  const check = (result: ReturnType<typeof assessConditions>, code: string) => result.checks.find((c) => c.code === code);
  const dew = dewPointC(20, 60);

  it('stops below a 3 °C surface margin and is a go from 3 °C, with information up to 5 °C', () => {
    // Design limit: surface at least 3 °C above the dew point, ISO 8502-4 practice (ingal.com.au
    // technical manual §13 and coating application guides; trade-reference §1.2, secondary sources).
    // The 5 °C information band: some data sheets ask for 5 °C (rust.co.uk, trade-reference §1.2).
    const level = (surface: number) => {
      const c = check(at(surface), 'dew-point-margin');
      return [c?.verdict, c?.info];
    };
    expect(level(dew + 2.99)).toEqual(['stop', false]);
    expect(level(dew + 3)).toEqual(['go', true]);
    expect(level(dew + 3.1)).toEqual(['go', true]);
    expect(level(dew + 4.99)).toEqual(['go', true]);
    expect(level(dew + 5)).toEqual(['go', false]);
    expect(at(dew + 3.1).verdict).toBe('go');
    expect(check(at(dew + 3.1), 'dew-point-margin')?.message).toMatch(/^The surface is 3\.1 °C above the dew point \(12\.0 °C\): within the 3\.0 °C limit/);
  });

  it('says a surface colder than the dew point is below it, never "only … above"', () => {
    // Air 20 °C, RH 60 %: dew point 12.0 °C (Magnus, Alduchov–Eskridge); a 7.4 °C surface is 4.6 °C below it.
    const message = check(at(dew - 4.6), 'dew-point-margin')?.message ?? '';
    expect(message).toMatch(/^The surface is 4\.6 °C below the dew point \(12\.0 °C\)/);
    expect(message).not.toMatch(/only|−|-4/);
    expect(check(at(dew), 'dew-point-margin')?.message).toMatch(/^The surface is at the dew point/);
    expect(check(at(dew + 1), 'dew-point-margin')?.message).toMatch(/^The surface is only 1\.0 °C above the dew point/);
  });

  it('puts the margin in words for every screen, in either unit system', () => {
    expect(surfaceMarginWords(-4.6)).toBe('4.6 °C below the dew point');
    expect(surfaceMarginWords(2.5)).toBe('2.5 °C above the dew point');
    expect(surfaceMarginWords(-0.02)).toBe('at the dew point');
    expect(surfaceMarginWords(0.5)).toBe('0.5 °C above the dew point');
    // A temperature difference converts without the 32° offset: 5 K = 9 °F (NIST SP 811 §B.8).
    expect(surfaceMarginWords(-5, 'us')).toBe('9.0 °F below the dew point');
  });

  it('reports the dew point and margin it judged on', () => {
    const result = at(18);
    expect(result.dewPointC).toBeCloseTo(dew, 10);
    expect(result.surfaceMarginC).toBeCloseTo(18 - dew, 10);
  });

  it('judges humidity against the product maximum, with information in the 5 points below it', () => {
    // The data sheet's maximum is the limit; the 5-point band is common practice, no published source.
    const rh = (relativeHumidityPct: number) => {
      const c = check(assessConditions({ airTempC: 25, surfaceTempC: 40, relativeHumidityPct, maxRelativeHumidityPct: 80 }), 'relative-humidity');
      return [c?.verdict, c?.info];
    };
    expect(rh(74)).toEqual(['go', false]);
    expect(rh(75)).toEqual(['go', true]);
    expect(rh(80)).toEqual(['go', true]);
    expect(rh(80.5)).toEqual(['stop', false]);
  });

  it('judges air and surface against the minimum temperature, with information in the 2 °C above it', () => {
    // The data sheet's minimum is the limit; the 2 °C band is common practice, no published source.
    const levels = (airTempC: number, surfaceTempC: number) => {
      const result = assessConditions({ airTempC, surfaceTempC, relativeHumidityPct: 30, minApplicationTempC: 15 });
      return [check(result, 'air-temperature'), check(result, 'surface-temperature')].map((c) => `${c?.verdict}${c?.info ? '+info' : ''}`);
    };
    expect(levels(14.9, 20)).toEqual(['stop', 'go']);
    expect(levels(20, 16)).toEqual(['go', 'go+info']);
    expect(levels(17, 17.1)).toEqual(['go+info', 'go']);
  });

  it('takes the worst check as the overall verdict and says why in words', () => {
    const result = assessConditions({ airTempC: 20, relativeHumidityPct: 90, surfaceTempC: 19, maxRelativeHumidityPct: 85 });
    expect(result.verdict).toBe('stop');
    expect(check(result, 'dew-point-margin')?.message).toMatch(/condense/);
    expect(check(result, 'relative-humidity')?.message).toMatch(/above this product's maximum of 85 %/);
  });

  it('falls back to general limits when no product is chosen', () => {
    const result = assessConditions({ airTempC: 9, relativeHumidityPct: 40, surfaceTempC: 9 });
    expect(check(result, 'air-temperature')?.verdict).toBe('stop');
    expect(check(result, 'air-temperature')?.message).toMatch(/no product chosen/);
  });

  it('writes temperatures in the user’s units', () => {
    const result = assessConditions({ airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 20, units: 'us' });
    expect(check(result, 'air-temperature')?.message).toContain('68.0 °F');
    expect(result.verdict).toBe('go');
  });

  it('refuses a missing surface temperature, naming the field', () => {
    expect(() => at(Number.NaN)).toThrow(expect.objectContaining({ field: 'surfaceTempC' }));
  });
});
