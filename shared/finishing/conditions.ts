import { FinishingInputError } from '../errors';
import type { UnitSystem } from '../schemas/common';
import { formatQuantity } from '../units';
import { requireBetween, requireFinite } from './validate';

export type Verdict = 'go' | 'caution' | 'stop';
/**
 * One rule's verdict. `info` marks a go that sits close to its limit: worth showing on the
 * calculator and the pre-spray checks, never a warning on a coat (the reading is within limits).
 */
export type ConditionCheck = { code: string; verdict: Verdict; info: boolean; message: string };

// Magnus form over liquid water with the Alduchov–Eskridge (1996) coefficients, fitted for −40…+50 °C.
const magnusA = 17.625;
const magnusB = 243.04;

/**
 * The margins the verdicts use. Below 3 °C surface-above-dew-point is the coating trade's
 * limit (ISO 8502-4 practice): a stop. At or above it the surface is within limits; up to 5 °C
 * the check adds information (some data sheets ask for 5 °C, and a cold part's surface reading
 * drifts as it warms), which is not a warning. Product limits get the same kind of information
 * band (5 points of RH, 2 °C) so the sprayer hears before the limit is reached, not after.
 */
export const conditionMargins = { stopBelowC: 3, infoBelowC: 5, humidityBandPct: 5, temperatureBandC: 2 } as const;

/** Used when no product is chosen: the general application limits coating guides give (air 10 °C, RH 85 %). */
export const generalApplicationLimits = { minApplicationTempC: 10, maxRelativeHumidityPct: 85 } as const;

const verdictRank: Record<Verdict, number> = { go: 0, caution: 1, stop: 2 };

export function worstVerdict(verdicts: Verdict[]): Verdict {
  return verdicts.reduce<Verdict>((worst, v) => (verdictRank[v] > verdictRank[worst] ? v : worst), 'go');
}

/** Dew point (°C) from air temperature (°C) and relative humidity (%). */
export function dewPointC(airTempC: number, relativeHumidityPct: number): number {
  requireBetween('airTempC', airTempC, 'the air temperature', -40, 60);
  requireFinite('relativeHumidityPct', relativeHumidityPct, 'the relative humidity');
  // ln(0) has no value, and above 100 % the air would already be condensing.
  if (relativeHumidityPct <= 0 || relativeHumidityPct > 100) {
    throw new FinishingInputError('relativeHumidityPct', 'Relative humidity must be more than 0 and at most 100 %');
  }
  const gamma = Math.log(relativeHumidityPct / 100) + (magnusA * airTempC) / (magnusB + airTempC);
  return (magnusB * gamma) / (magnusA - gamma);
}

export type ConditionsInput = {
  airTempC: number;
  relativeHumidityPct: number;
  surfaceTempC: number;
  minApplicationTempC?: number | null;
  maxRelativeHumidityPct?: number | null;
  units?: UnitSystem;
};

export type ConditionsAssessment = {
  dewPointC: number;
  surfaceMarginC: number;
  verdict: Verdict;
  checks: ConditionCheck[];
};

/**
 * Go or stop for spraying now, with one check per rule so the sprayer sees which one bites. A
 * reading within its limit is a go (with `info` when it is close); only one outside is a stop.
 */
export function assessConditions(input: ConditionsInput): ConditionsAssessment {
  requireBetween('surfaceTempC', input.surfaceTempC, 'the surface temperature', -40, 80);
  if (input.minApplicationTempC != null) {
    requireFinite('minApplicationTempC', input.minApplicationTempC, 'the minimum application temperature');
  }
  if (input.maxRelativeHumidityPct != null) {
    requireBetween('maxRelativeHumidityPct', input.maxRelativeHumidityPct, 'the maximum humidity', 1, 100);
  }
  const dewPoint = dewPointC(input.airTempC, input.relativeHumidityPct);
  const surfaceMarginC = input.surfaceTempC - dewPoint;
  const units = input.units ?? 'metric';
  const checks = [
    dewPointCheck(surfaceMarginC, dewPoint, units),
    humidityCheck(input.relativeHumidityPct, input.maxRelativeHumidityPct),
    temperatureCheck('air-temperature', 'The air', input.airTempC, input.minApplicationTempC, units),
    temperatureCheck('surface-temperature', 'The surface', input.surfaceTempC, input.minApplicationTempC, units),
  ];
  return { dewPointC: dewPoint, surfaceMarginC, verdict: worstVerdict(checks.map((c) => c.verdict)), checks };
}

/**
 * Where the surface stands against the dew point, in words: "4.6 °C above the dew point",
 * "2.1 °C below the dew point" or "at the dew point". A negative margin is never "above".
 */
export function surfaceMarginWords(marginC: number, units: UnitSystem = 'metric'): string {
  const size = formatQuantity(Math.abs(marginC), 'temperatureDifference', units);
  // Judged on the figure as shown, so "0.0 °C below" can never appear.
  if (Number.parseFloat(size) === 0) return 'at the dew point';
  return `${size} ${marginC < 0 ? 'below' : 'above'} the dew point`;
}

function dewPointCheck(marginC: number, dewPoint: number, units: UnitSystem): ConditionCheck {
  const margin = formatQuantity(marginC, 'temperatureDifference', units);
  const dew = formatQuantity(dewPoint, 'temperature', units);
  const needed = formatQuantity(conditionMargins.stopBelowC, 'temperatureDifference', units);
  const fix = `Warm the parts or dry the air until the surface is at least ${needed} above the dew point.`;
  const where = surfaceMarginWords(marginC, units);
  if (!where.endsWith('above the dew point')) {
    return {
      code: 'dew-point-margin',
      verdict: 'stop',
      info: false,
      message: `The surface is ${where} (${dew}): moisture will condense on the part and spoil the finish. ${fix}`,
    };
  }
  if (marginC < conditionMargins.stopBelowC) {
    return {
      code: 'dew-point-margin',
      verdict: 'stop',
      info: false,
      message: `The surface is only ${margin} above the dew point (${dew}). Moisture can condense on the part and spoil the finish. ${fix}`,
    };
  }
  if (marginC < conditionMargins.infoBelowC) {
    return {
      code: 'dew-point-margin',
      verdict: 'go',
      info: true,
      message: `The surface is ${margin} above the dew point (${dew}): within the ${needed} limit. Check cold parts again before spraying; some data sheets ask for more.`,
    };
  }
  return { code: 'dew-point-margin', verdict: 'go', info: false, message: `The surface is ${margin} above the dew point (${dew}).` };
}

function humidityCheck(rhPct: number, productMax: number | null | undefined): ConditionCheck {
  const max = productMax ?? generalApplicationLimits.maxRelativeHumidityPct;
  const whose = productMax == null ? 'the general limit (no product chosen)' : "this product's maximum";
  const rh = `${rhPct.toFixed(0)} %`;
  if (rhPct > max) {
    return {
      code: 'relative-humidity',
      verdict: 'stop',
      info: false,
      message: `Humidity ${rh} is above ${whose} of ${max} %. The film can blush, stay soft or (with 2K) gas. Do not spray until the air is drier.`,
    };
  }
  if (rhPct >= max - conditionMargins.humidityBandPct) {
    return {
      code: 'relative-humidity',
      verdict: 'go',
      info: true,
      message: `Humidity ${rh} is within ${whose} of ${max} %, but close to it. Expect slower drying; watch for blushing.`,
    };
  }
  return { code: 'relative-humidity', verdict: 'go', info: false, message: `Humidity ${rh} is within ${whose} of ${max} %.` };
}

function temperatureCheck(
  code: string,
  subject: string,
  tempC: number,
  productMin: number | null | undefined,
  units: UnitSystem,
): ConditionCheck {
  const min = productMin ?? generalApplicationLimits.minApplicationTempC;
  const whose = productMin == null ? 'the general minimum (no product chosen)' : "this product's minimum";
  const [shown, minShown] = [formatQuantity(tempC, 'temperature', units), formatQuantity(min, 'temperature', units)];
  if (tempC < min) {
    return {
      code,
      verdict: 'stop',
      info: false,
      message: `${subject} at ${shown} is below ${whose} of ${minShown}. The coating may not flow, dry or cure. Warm it up first.`,
    };
  }
  if (tempC <= min + conditionMargins.temperatureBandC) {
    return {
      code,
      verdict: 'go',
      info: true,
      message: `${subject} at ${shown} is only just above ${whose} of ${minShown}. Drying will be slow; allow extra time.`,
    };
  }
  return { code, verdict: 'go', info: false, message: `${subject} at ${shown} is above ${whose} of ${minShown}.` };
}
