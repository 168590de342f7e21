/** A drying time is typed in minutes or hours, as the data sheet gives it, and stored in minutes. */
export type DurationUnit = 'min' | 'h';

export const durationUnitWords: Record<DurationUnit, string> = { min: 'min', h: 'hours' };

/**
 * The unit a stored time reads best in: whole or half hours from an hour up ("16 h", "1.5 h"),
 * minutes otherwise ("45 min", "100 min"). A blank time keeps minutes.
 */
export function durationUnitFor(minutes: number | null | undefined): DurationUnit {
  if (typeof minutes !== 'number' || !Number.isFinite(minutes)) return 'min';
  return minutes >= 60 && minutes % 30 === 0 ? 'h' : 'min';
}

/** What was typed, in minutes; undefined for a blank or unreadable box (the form says what is missing). */
export function typedMinutes(text: string, unit: DurationUnit): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  const amount = Number(trimmed);
  if (!Number.isFinite(amount)) return undefined;
  // Hours become whole hundredths of a minute, so 0.1 h is 6 min and not 6.000000000000001.
  return unit === 'h' ? Math.round(amount * 60 * 100) / 100 : amount;
}

/** The stored minutes as the box shows them in a unit: "16" for 960 in hours; blank for none. */
export function amountText(minutes: number | null | undefined, unit: DurationUnit): string {
  if (typeof minutes !== 'number' || !Number.isFinite(minutes)) return '';
  const amount = unit === 'h' ? Math.round((minutes / 60) * 100) / 100 : minutes;
  return String(amount);
}
