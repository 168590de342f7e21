import { FinishingInputError } from '../errors';

/**
 * Due dates of booth upkeep and crew protection records. They are calendar dates in the shop's
 * zone (YYYY-MM-DD), never instants: a test done on 31 January is due on a day, not at an hour,
 * so summer time cannot move it. "Today" is the caller's: the shop's calendar date of the moment
 * it asks about (see `calendarDateIn` in shared/time.ts).
 */
export type DueStatus = 'valid' | 'due-soon' | 'lapsed' | 'none';

const datePattern = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Days since 1970-01-01 of a calendar date; refuses text that is not a real date. */
function dayNumber(date: string, field = 'date'): number {
  const match = datePattern.exec(date);
  if (!match) throw new FinishingInputError(field, 'Give the date as YYYY-MM-DD');
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const utc = Date.UTC(year, month - 1, day);
  const back = new Date(utc);
  if (back.getUTCFullYear() !== year || back.getUTCMonth() !== month - 1 || back.getUTCDate() !== day) throw new FinishingInputError(field, 'That date does not exist');
  return utc / 86_400_000;
}

function fromDayNumber(days: number): string {
  return new Date(days * 86_400_000).toISOString().slice(0, 10);
}

/**
 * The same day `months` calendar months later; when that month is shorter, its last day
 * (31 January + 1 month = 28 or 29 February), as date-fns `addMonths` and most calendars do.
 */
export function addCalendarMonths(date: string, months: number): string {
  if (!Number.isInteger(months) || months < 0 || months > 240) throw new FinishingInputError('months', 'Give a whole number of months from 0 to 240');
  dayNumber(date);
  const [year, month, day] = date.split('-').map(Number);
  const target = (month - 1 + months) % 12;
  const targetYear = year + Math.floor((month - 1 + months) / 12);
  const lastDay = new Date(Date.UTC(targetYear, target + 1, 0)).getUTCDate();
  return fromDayNumber(Date.UTC(targetYear, target, Math.min(day, lastDay)) / 86_400_000);
}

/** Whole days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return dayNumber(to, 'to') - dayNumber(from, 'from');
}

/**
 * Where a record with this next-due date stands on `today`: valid through the due date itself,
 * due soon within `dueSoonDays` of it, lapsed from the day after; `none` without a date.
 */
export function dueStatus(nextDueOn: string | null, today: string, dueSoonDays: number): DueStatus {
  if (nextDueOn === null) return 'none';
  const left = daysBetween(today, nextDueOn);
  if (left < 0) return 'lapsed';
  return left <= dueSoonDays ? 'due-soon' : 'valid';
}

/** The next-due date: the one the tester gave, else the done date plus the shop's interval. */
export function nextDueDate(doneOn: string, intervalMonths: number | null, givenNextDueOn: string | null): string | null {
  if (givenNextDueOn !== null) {
    if (daysBetween(doneOn, givenNextDueOn) < 0) throw new FinishingInputError('nextDueOn', 'The next due date cannot be before the date it was done');
    return givenNextDueOn;
  }
  return intervalMonths === null ? null : addCalendarMonths(doneOn, intervalMonths);
}

/** The worse of two statuses, for a person's or a booth's summary: lapsed, then due soon, then none, then valid. */
export function worseStatus(a: DueStatus, b: DueStatus): DueStatus {
  const rank: Record<DueStatus, number> = { lapsed: 3, 'due-soon': 2, none: 1, valid: 0 };
  return rank[a] >= rank[b] ? a : b;
}

/**
 * The mean face velocity of a traverse: the arithmetic mean of the readings taken over a grid
 * across the open face (common practice, no published source for the grid itself).
 */
export function meanFaceVelocityMps(points: number[]): number {
  if (points.length === 0) throw new FinishingInputError('faceVelocityPointsMps', 'Enter at least one reading');
  if (points.some((p) => !Number.isFinite(p) || p < 0)) throw new FinishingInputError('faceVelocityPointsMps', 'Readings are speeds of 0 m/s or more');
  return points.reduce((sum, p) => sum + p, 0) / points.length;
}

export type FilterStatus = 'ok' | 'near-limit' | 'over-limit' | 'no-reading';

/**
 * A bank is near its limit from this share of its change-at pressure drop, so the change can be
 * planned before it is forced (common practice, no published source).
 */
export const filterNearLimitShare = 0.8;

export interface FilterBankState {
  changeAtPa: number;
  latestReading: { pressureDropPa: number; at: string } | null;
  lastChange: { changedAt: string; afterPa: number | null } | null;
}

/**
 * What the filter gauge says now: the latest reading taken after the last change, else the
 * reading noted when the filters were changed. A reading from before the change says nothing
 * about the new filters. At or past the maker's change-at pressure drop the filters must be changed.
 */
export function filterBankStatus(bank: FilterBankState): { status: FilterStatus; currentPa: number | null } {
  const { latestReading, lastChange } = bank;
  const readingCounts = latestReading !== null && (lastChange === null || latestReading.at > lastChange.changedAt);
  const currentPa = readingCounts ? latestReading.pressureDropPa : (lastChange?.afterPa ?? null);
  if (currentPa === null) return { status: 'no-reading', currentPa };
  if (currentPa >= bank.changeAtPa) return { status: 'over-limit', currentPa };
  return { status: currentPa >= bank.changeAtPa * filterNearLimitShare ? 'near-limit' : 'ok', currentPa };
}
