import type { DryingMethod } from '../../shared/finishing/drying-times';

/**
 * A drying time as a person reads it off a board: "45 min", "3 h 20 min", "2 d 4 h".
 * Rounded to the whole minute; beyond two days the minutes no longer matter to anyone.
 */
export function formatMinutes(minutes: number): string {
  if (!Number.isFinite(minutes)) return '—';
  const whole = Math.round(minutes);
  if (whole < 60) return `${whole} min`;
  const hours = Math.floor(whole / 60);
  const rest = whole % 60;
  if (hours < 48) return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
  const days = Math.floor(hours / 24);
  const restHours = Math.round((whole - days * 1440) / 60);
  return restHours === 0 ? `${days} d` : `${days} d ${restHours} h`;
}

/** Full cure is given in hours on data sheets; long ones also read as days. */
export function formatHours(hours: number): string {
  if (!Number.isFinite(hours)) return '—';
  const shown = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 }).format(hours);
  if (hours < 48) return `${shown} h`;
  return `${shown} h (${new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 }).format(hours / 24)} days)`;
}

/** How adjustDryingTimes got its figures, in words a lead can check against the data sheet. */
export const dryingMethodWords: Record<DryingMethod, string> = {
  'exact-row': 'Exact row: the data sheet gives times at this temperature.',
  interpolated: 'Interpolated between the two data-sheet rows either side of this temperature.',
  extrapolated: 'Extrapolated beyond the data sheet’s temperatures from its nearest two rows; treat as a rough guide.',
  'single-row-rule':
    'Estimated from the data sheet’s one row by the 10 °C rule (times double for every 10 °C colder, halve for every 10 °C warmer); a rule of thumb, not the maker’s figure.',
};
