import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ConditionsReport } from '../../../../shared/schemas/report';
import { surfaceMarginWords } from '../../../../shared/finishing/conditions';
import { formatQuantity } from '../../../../shared/units';

type Coat = ConditionsReport['coatsOutside'][number];
type Limit = ConditionsReport['limits'][number];

/** The limits drawn on the chart: the strictest of the products sprayed (highest minimum, lowest maximum). */
export function strictestLimits(limits: Limit[]): { minTempC: Limit | null; maxRh: Limit | null } {
  const withMin = limits.filter((l) => l.minApplicationTempC !== null).sort((a, b) => b.minApplicationTempC! - a.minApplicationTempC!);
  const withMax = limits.filter((l) => l.maxRelativeHumidityPct !== null).sort((a, b) => a.maxRelativeHumidityPct! - b.maxRelativeHumidityPct!);
  return { minTempC: withMin[0] ?? null, maxRh: withMax[0] ?? null };
}

/** A product's limits in a line: "min. 10.0 °C, max. 85 % RH". */
export function limitWords(limit: Limit, units: UnitSystem): string {
  const parts = [
    limit.minApplicationTempC === null ? null : `min. ${formatQuantity(limit.minApplicationTempC, 'temperature', units)}`,
    limit.maxRelativeHumidityPct === null ? null : `max. ${limit.maxRelativeHumidityPct} % RH`,
  ].filter(Boolean);
  return parts.length ? parts.join(', ') : 'no limits on its data sheet';
}

/** Why a coat counts as outside, in words, with the coat's figure and the limit it broke. */
export function outsideReasonWords(coat: Coat, limit: Limit | undefined, minMarginC: number, units: UnitSystem): string[] {
  const temperature = (c: number) => formatQuantity(c, 'temperature', units);
  const minimum = limit?.minApplicationTempC;
  const minimumWords = minimum === null || minimum === undefined ? '' : ` (minimum ${temperature(minimum)})`;
  return coat.reasons.map((reason) => {
    switch (reason) {
      case 'air-too-cold':
        return `Air too cold: ${temperature(coat.airTempC)}${minimumWords}`;
      case 'surface-too-cold':
        return `Surface too cold: ${temperature(coat.surfaceTempC)}${minimumWords}`;
      case 'rh-too-high':
        return `Humidity too high: ${Math.round(coat.relativeHumidityPct)} %${limit?.maxRelativeHumidityPct ? ` (maximum ${limit.maxRelativeHumidityPct} %)` : ''}`;
      case 'dew-point-margin':
        return `${coat.dewPointMarginC < 0 ? 'Below' : 'Too close to'} the dew point: surface ${surfaceMarginWords(coat.dewPointMarginC, units)} (needs at least ${formatQuantity(minMarginC, 'temperatureDifference', units)} above)`;
    }
  });
}
