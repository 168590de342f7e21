import { requireNonNegative, requirePositive } from './validate';

/**
 * Minutes a spray session needs: spraying time from the area and the booth's spray rate
 * (m² per hour), plus set-up and clean-down from the shop's settings, rounded up to 5 minutes.
 */
export function sessionMinutes({ areaM2, sprayRateM2PerH, setupMin, cleanDownMin }: { areaM2: number; sprayRateM2PerH: number; setupMin: number; cleanDownMin: number }): number {
  requireNonNegative('areaM2', areaM2, 'the area');
  requirePositive('sprayRateM2PerH', sprayRateM2PerH, 'the spray rate');
  requireNonNegative('setupMin', setupMin, 'the set-up time');
  requireNonNegative('cleanDownMin', cleanDownMin, 'the clean-down time');
  const total = (areaM2 / sprayRateM2PerH) * 60 + setupMin + cleanDownMin;
  return Math.ceil(total / 5) * 5;
}
