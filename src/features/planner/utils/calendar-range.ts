import { shopWallToInstant } from './shop-wall-clock';

export type PlannerView = 'week' | 'day';

const dayMs = 86_400_000;
const toDate = (day: string) => new Date(`${day}T00:00:00Z`);
const toDay = (at: Date) => at.toISOString().slice(0, 10);

export function addDays(day: string, days: number): string {
  return toDay(new Date(toDate(day).getTime() + days * dayMs));
}

/** The Monday of the week `day` falls in: the shop's week starts on a Monday. */
export function mondayOf(day: string): string {
  const isoWeekday = toDate(day).getUTCDay() || 7;
  return addDays(day, 1 - isoWeekday);
}

/** First and last shop days on screen. */
function visibleDays(view: PlannerView, day: string): { first: string; afterLast: string } {
  const first = view === 'week' ? mondayOf(day) : day;
  return { first, afterLast: addDays(first, view === 'week' ? 7 : 1) };
}

/** The instants to ask the server for: shop midnight to shop midnight, whatever the device's zone. */
export function visibleRange(view: PlannerView, day: string, timeZone: string): { from: string; to: string } {
  const { first, afterLast } = visibleDays(view, day);
  return { from: shopWallToInstant(first, '00:00', timeZone).toISOString(), to: shopWallToInstant(afterLast, '00:00', timeZone).toISOString() };
}

export function stepDay(view: PlannerView, day: string, direction: 1 | -1): string {
  return addDays(day, direction * (view === 'week' ? 7 : 1));
}

const dayFormat = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' });
const shortFormat = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short' });

/** "Week of 6–12 Jul 2026" or "Tuesday 7 July 2026". */
export function rangeTitle(view: PlannerView, day: string): string {
  if (view === 'day') return dayFormat.format(toDate(day));
  const { first, afterLast } = visibleDays('week', day);
  const last = toDate(addDays(afterLast, -1));
  return `Week of ${shortFormat.format(toDate(first))} – ${shortFormat.format(last)} ${last.getUTCFullYear()}`;
}
