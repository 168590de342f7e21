import type { UnitSystem } from './schemas/common';

// Values are stored in SI-style units (°C, µm, m², L, m³, m³/h, m/s, g/L, g, m²/L) and
// converted only for display. The factors below are exact by definition (international
// foot 0.3048 m, US gallon 231 in³ = 3.785411784 L, avoirdupois pound 453.59237 g).
const metresPerFoot = 0.3048;
const micrometresPerMil = 25.4;
const litresPerUsGallon = 3.785411784;
const gramsPerPound = 453.59237;
const squareMetresPerSquareFoot = metresPerFoot ** 2;
const cubicMetresPerCubicFoot = metresPerFoot ** 3;

export const celsiusToFahrenheit = (c: number): number => (c * 9) / 5 + 32;
export const fahrenheitToCelsius = (f: number): number => ((f - 32) * 5) / 9;
/** A temperature *difference* (e.g. a margin above dew point) has no 32° offset. */
export const celsiusDeltaToFahrenheit = (dc: number): number => (dc * 9) / 5;
export const fahrenheitDeltaToCelsius = (df: number): number => (df * 5) / 9;

export const micrometresToMils = (um: number): number => um / micrometresPerMil;
export const milsToMicrometres = (mils: number): number => mils * micrometresPerMil;

export const squareMetresToSquareFeet = (m2: number): number => m2 / squareMetresPerSquareFoot;
export const squareFeetToSquareMetres = (ft2: number): number => ft2 * squareMetresPerSquareFoot;

export const litresToUsGallons = (l: number): number => l / litresPerUsGallon;
export const usGallonsToLitres = (gal: number): number => gal * litresPerUsGallon;

export const cubicMetresToCubicFeet = (m3: number): number => m3 / cubicMetresPerCubicFoot;
export const cubicFeetToCubicMetres = (ft3: number): number => ft3 * cubicMetresPerCubicFoot;

/** m³/h → ft³/min (cfm). */
export const cubicMetresPerHourToCfm = (m3h: number): number => m3h / cubicMetresPerCubicFoot / 60;
export const cfmToCubicMetresPerHour = (cfm: number): number => cfm * cubicMetresPerCubicFoot * 60;

/** m/s → ft/min (fpm), the unit US booth face-velocity rules are written in. */
export const metresPerSecondToFpm = (mps: number): number => (mps / metresPerFoot) * 60;
export const fpmToMetresPerSecond = (fpm: number): number => (fpm * metresPerFoot) / 60;

export const gramsPerLitreToPoundsPerUsGallon = (gl: number): number => (gl * litresPerUsGallon) / gramsPerPound;
export const poundsPerUsGallonToGramsPerLitre = (lbgal: number): number => (lbgal * gramsPerPound) / litresPerUsGallon;

export const gramsToPounds = (g: number): number => g / gramsPerPound;
export const poundsToGrams = (lb: number): number => lb * gramsPerPound;

/** m²/L → ft²/US gal, the coverage figure US data sheets quote. */
export const squareMetresPerLitreToSquareFeetPerUsGallon = (m2l: number): number =>
  squareMetresToSquareFeet(m2l) * litresPerUsGallon;
export const squareFeetPerUsGallonToSquareMetresPerLitre = (ft2gal: number): number =>
  squareFeetToSquareMetres(ft2gal) / litresPerUsGallon;

export const quantities = [
  'temperature',
  'temperatureDifference',
  'filmThickness',
  'area',
  'liquidVolume',
  'roomVolume',
  'airflow',
  'airSpeed',
  'vocContent',
  'mass',
  'spreadingRate',
] as const;
export type Quantity = (typeof quantities)[number];

type Display = { symbol: string; digits: number };
type QuantityUnits = { metric: Display; us: Display; toUs: (si: number) => number; fromUs: (us: number) => number };

// Digits are chosen so a displayed value is as precise as a shop instrument reads it.
const quantityUnits: Record<Quantity, QuantityUnits> = {
  temperature: {
    metric: { symbol: '°C', digits: 1 },
    us: { symbol: '°F', digits: 1 },
    toUs: celsiusToFahrenheit,
    fromUs: fahrenheitToCelsius,
  },
  temperatureDifference: {
    metric: { symbol: '°C', digits: 1 },
    us: { symbol: '°F', digits: 1 },
    toUs: celsiusDeltaToFahrenheit,
    fromUs: fahrenheitDeltaToCelsius,
  },
  filmThickness: {
    metric: { symbol: 'µm', digits: 0 },
    us: { symbol: 'mil', digits: 2 },
    toUs: micrometresToMils,
    fromUs: milsToMicrometres,
  },
  area: {
    metric: { symbol: 'm²', digits: 2 },
    us: { symbol: 'ft²', digits: 1 },
    toUs: squareMetresToSquareFeet,
    fromUs: squareFeetToSquareMetres,
  },
  liquidVolume: {
    metric: { symbol: 'L', digits: 2 },
    us: { symbol: 'US gal', digits: 2 },
    toUs: litresToUsGallons,
    fromUs: usGallonsToLitres,
  },
  roomVolume: {
    metric: { symbol: 'm³', digits: 1 },
    us: { symbol: 'ft³', digits: 0 },
    toUs: cubicMetresToCubicFeet,
    fromUs: cubicFeetToCubicMetres,
  },
  airflow: {
    metric: { symbol: 'm³/h', digits: 0 },
    us: { symbol: 'cfm', digits: 0 },
    toUs: cubicMetresPerHourToCfm,
    fromUs: cfmToCubicMetresPerHour,
  },
  airSpeed: {
    metric: { symbol: 'm/s', digits: 2 },
    us: { symbol: 'fpm', digits: 0 },
    toUs: metresPerSecondToFpm,
    fromUs: fpmToMetresPerSecond,
  },
  vocContent: {
    metric: { symbol: 'g/L', digits: 0 },
    us: { symbol: 'lb/US gal', digits: 2 },
    toUs: gramsPerLitreToPoundsPerUsGallon,
    fromUs: poundsPerUsGallonToGramsPerLitre,
  },
  mass: {
    metric: { symbol: 'g', digits: 0 },
    us: { symbol: 'lb', digits: 2 },
    toUs: gramsToPounds,
    fromUs: poundsToGrams,
  },
  spreadingRate: {
    metric: { symbol: 'm²/L', digits: 2 },
    us: { symbol: 'ft²/US gal', digits: 0 },
    toUs: squareMetresPerLitreToSquareFeetPerUsGallon,
    fromUs: squareFeetPerUsGallonToSquareMetresPerLitre,
  },
};

/** Converts a stored (SI) value into the number a user of `system` sees. */
export function toDisplay(siValue: number, quantity: Quantity, system: UnitSystem): number {
  return system === 'metric' ? siValue : quantityUnits[quantity].toUs(siValue);
}

/** Converts a number a user typed in `system` back into the stored (SI) value. */
export function fromDisplay(displayValue: number, quantity: Quantity, system: UnitSystem): number {
  return system === 'metric' ? displayValue : quantityUnits[quantity].fromUs(displayValue);
}

export function unitSymbol(quantity: Quantity, system: UnitSystem): string {
  return quantityUnits[quantity][system].symbol;
}

export function displayDigits(quantity: Quantity, system: UnitSystem): number {
  return quantityUnits[quantity][system].digits;
}

// Building an Intl.NumberFormat costs far more than using one: one per number of digits, kept.
const numberFormats = new Map<number, Intl.NumberFormat>();
function numberFormat(digits: number): Intl.NumberFormat {
  let format = numberFormats.get(digits);
  if (!format) numberFormats.set(digits, (format = new Intl.NumberFormat('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits })));
  return format;
}

/** A stored (SI) value as text in the user's units, e.g. "68.0 °F" or "176 µm". */
export function formatQuantity(
  siValue: number,
  quantity: Quantity,
  system: UnitSystem,
  digits: number = displayDigits(quantity, system),
): string {
  const shown = toDisplay(siValue, quantity, system);
  // Rounding a tiny negative to zero must not print "-0.0".
  const cleaned = Math.abs(shown) < 0.5 * 10 ** -digits ? 0 : shown;
  const number = numberFormat(digits).format(cleaned);
  return `${number} ${unitSymbol(quantity, system)}`;
}
