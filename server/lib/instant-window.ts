import { AppError } from './app-error';

/**
 * How far from now an instant people type for something that happened (a coat sprayed, a pot
 * mixed, a reading taken) may be. Ninety days back covers entering a few weeks of paper records
 * and a tablet resending after days offline; a quarter of an hour ahead allows for a device clock
 * a little fast. Anything else is a typing slip (a year 9999 or 0000) and is refused, not stored.
 */
export const happenedWindow = { pastDays: 90, futureMinutes: 15 } as const;

const dayMs = 24 * 60 * 60 * 1000;

/** Throws a field-level 400 when `value` (an ISO instant, if given) is outside the window around `now`. */
export function assertHappenedNearNow(value: string | null | undefined, field: string, now: Date): void {
  if (!value) return;
  const at = Date.parse(value);
  if (at < now.getTime() - happenedWindow.pastDays * dayMs) {
    throw new AppError('validation_failed', `That date is more than ${happenedWindow.pastDays} days ago`, { [field]: `Must be within the last ${happenedWindow.pastDays} days; check the date` });
  }
  if (at > now.getTime() + happenedWindow.futureMinutes * 60_000) {
    throw new AppError('validation_failed', 'That time is in the future', { [field]: 'Cannot be in the future; check the date and the device’s clock' });
  }
}
