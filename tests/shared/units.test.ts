import fc from 'fast-check';
import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import * as units from '../../shared/units';

// Every factor is checked against mathjs's own unit definitions (international foot, US liquid gallon,
// avoirdupois pound, mil = 0.001 in). Relative tolerance 1e-12: the definitions are exact, so only float
// rounding separates the two.
const closeTo = (actual: number, expected: number) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(expected)));

type Pair = [name: string, toUs: (v: number) => number, fromUs: (v: number) => number, si: string, us: string];
const pairs: Pair[] = [
  ['°C ↔ °F', units.celsiusToFahrenheit, units.fahrenheitToCelsius, 'degC', 'degF'],
  ['°C ↔ °F difference', units.celsiusDeltaToFahrenheit, units.fahrenheitDeltaToCelsius, 'K', 'degR'],
  ['µm ↔ mil', units.micrometresToMils, units.milsToMicrometres, 'um', 'mil'],
  ['m² ↔ ft²', units.squareMetresToSquareFeet, units.squareFeetToSquareMetres, 'm^2', 'ft^2'],
  ['L ↔ US gal', units.litresToUsGallons, units.usGallonsToLitres, 'L', 'gal'],
  ['m³ ↔ ft³', units.cubicMetresToCubicFeet, units.cubicFeetToCubicMetres, 'm^3', 'ft^3'],
  ['m³/h ↔ cfm', units.cubicMetresPerHourToCfm, units.cfmToCubicMetresPerHour, 'm^3/h', 'ft^3/min'],
  ['m/s ↔ fpm', units.metresPerSecondToFpm, units.fpmToMetresPerSecond, 'm/s', 'ft/min'],
  ['g/L ↔ lb/US gal', units.gramsPerLitreToPoundsPerUsGallon, units.poundsPerUsGallonToGramsPerLitre, 'g/L', 'lbm/gal'],
  ['g ↔ lb', units.gramsToPounds, units.poundsToGrams, 'g', 'lbm'],
  ['m²/L ↔ ft²/US gal', units.squareMetresPerLitreToSquareFeetPerUsGallon, units.squareFeetPerUsGallonToSquareMetresPerLitre, 'm^2/L', 'ft^2/gal'],
];
const samples = [-40, -17.5, 0, 0.3, 1, 20, 125, 1699.01, 30000];

describe('unit conversions', () => {
  for (const [name, toUs, fromUs, si, us] of pairs) {
    it(`${name} agrees with mathjs both ways`, () => {
      for (const value of samples) {
        closeTo(toUs(value), unit(value, si).toNumber(us));
        closeTo(fromUs(value), unit(value, us).toNumber(si));
      }
    });

    it(`${name} round-trips any value`, () => {
      fc.assert(
        fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (value) => {
          const back = fromUs(toUs(value));
          return Math.abs(back - value) <= 1e-9 * Math.max(1, Math.abs(value));
        }),
      );
    });
  }

  it('matches the published check values', () => {
    // Sources: definitions (0.3048 m/ft); OSHA 1910.107 100 / 60 fpm and IMC 50 fpm; exact SI definitions for
    // lb/gal. Tolerances are the digits the values are published to.
    expect(units.fpmToMetresPerSecond(100)).toBeCloseTo(0.508, 12);
    expect(units.fpmToMetresPerSecond(50)).toBeCloseTo(0.254, 12);
    expect(units.fpmToMetresPerSecond(60)).toBeCloseTo(0.3048, 12);
    expect(Math.abs(units.cfmToCubicMetresPerHour(1000) - 1699.01)).toBeLessThan(0.01);
    expect(Math.abs(units.poundsPerUsGallonToGramsPerLitre(1) - 119.826)).toBeLessThan(0.001);
    expect(Math.abs(units.poundsPerUsGallonToGramsPerLitre(3.5) - 419.39)).toBeLessThan(0.01);
    expect(Math.abs(units.gramsPerLitreToPoundsPerUsGallon(250) - 2.0864)).toBeLessThan(0.0001);
  });
});

describe('toDisplay / fromDisplay', () => {
  it('leaves metric values as stored', () => {
    for (const quantity of units.quantities) expect(units.toDisplay(12.5, quantity, 'metric')).toBe(12.5);
  });

  it('converts for US users with the same factors mathjs uses', () => {
    closeTo(units.toDisplay(20, 'temperature', 'us'), unit(20, 'degC').toNumber('degF'));
    closeTo(units.toDisplay(3, 'temperatureDifference', 'us'), unit(3, 'K').toNumber('degR'));
    closeTo(units.fromDisplay(1.5, 'filmThickness', 'us'), unit(1.5, 'mil').toNumber('um'));
    closeTo(units.fromDisplay(400, 'airSpeed', 'us'), unit(400, 'ft/min').toNumber('m/s'));
  });
});

describe('formatQuantity', () => {
  it('writes the value with its unit symbol for each system', () => {
    expect(units.formatQuantity(20, 'temperature', 'metric')).toBe('20.0 °C');
    expect(units.formatQuantity(20, 'temperature', 'us')).toBe('68.0 °F');
    expect(units.formatQuantity(176.06, 'filmThickness', 'metric')).toBe('176 µm');
    expect(units.formatQuantity(25.4 * 3.57, 'filmThickness', 'us')).toBe('3.57 mil');
    expect(units.formatQuantity(1699.0108, 'airflow', 'metric')).toBe('1,699 m³/h');
    expect(units.formatQuantity(units.cfmToCubicMetresPerHour(1000), 'airflow', 'us')).toBe('1,000 cfm');
    expect(units.formatQuantity(419.39, 'vocContent', 'us', 1)).toBe('3.5 lb/US gal');
  });

  it('does not print a negative zero', () => {
    expect(units.formatQuantity(-0.01, 'temperature', 'metric')).toBe('0.0 °C');
  });
});
