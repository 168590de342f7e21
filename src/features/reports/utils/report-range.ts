/** A report's range: whole shop days, both ends included (YYYY-MM-DD). */
export interface DateRange {
  from: string;
  to: string;
}

export type QuickRangeId = 'last-4-weeks' | 'this-month' | 'last-month' | 'this-year' | 'last-12-months';

const pad = (n: number) => String(n).padStart(2, '0');
const monthParts = (month: string) => month.split('-').map(Number) as [number, number];

/** A month ("2026-03") moved by `by` months. */
export function shiftMonth(month: string, by: number): string {
  const [year, m] = monthParts(month);
  const index = year * 12 + (m - 1) + by;
  return `${Math.floor(index / 12)}-${pad((index % 12) + 1)}`;
}

/** A calendar day ("2026-03-02") moved by `by` days. */
export function shiftDay(day: string, by: number): string {
  const date = new Date(`${day}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + by);
  return date.toISOString().slice(0, 10);
}

function lastDayOf(month: string): string {
  const [year, m] = monthParts(month);
  return `${month}-${pad(new Date(Date.UTC(year, m, 0)).getUTCDate())}`;
}

export function monthRange(month: string): DateRange {
  return { from: `${month}-01`, to: lastDayOf(month) };
}

/**
 * The quick picks. "Last 4 weeks" is the 28 shop days up to today, so it always holds four full
 * weeks of work whatever the day of the month. The others are whole calendar periods so each monthly
 * bar is a full month; "Last 12 months" is the twelve calendar months ending with this one, which
 * keeps the current month's data in view.
 */
export function quickRange(id: QuickRangeId, today: string): DateRange {
  const month = today.slice(0, 7);
  const year = today.slice(0, 4);
  switch (id) {
    case 'last-4-weeks':
      return { from: shiftDay(today, -27), to: today };
    case 'this-month':
      return monthRange(month);
    case 'last-month':
      return monthRange(shiftMonth(month, -1));
    case 'this-year':
      return { from: `${year}-01-01`, to: `${year}-12-31` };
    case 'last-12-months':
      return { from: `${shiftMonth(month, -11)}-01`, to: lastDayOf(month) };
  }
}

/** The range Reports opens on: the last four weeks, which hold four weeks of work whatever the day of the month. */
export const openingRange = (today: string) => quickRange('last-4-weeks', today);

export const quickRangeLabels: Record<QuickRangeId, string> = {
  'last-4-weeks': 'Last 4 weeks',
  'this-month': 'This month',
  'last-month': 'Last month',
  'this-year': 'This year',
  'last-12-months': 'Last 12 months',
};

/** The month a range covers exactly, or null when it is not one whole month. */
export function wholeMonthOf(range: DateRange): string | null {
  const month = range.from.slice(0, 7);
  return range.from === `${month}-01` && range.to === lastDayOf(month) ? month : null;
}

const dayFormat = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' });
const monthFormat = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', month: 'long', year: 'numeric' });
const shortMonthFormat = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', month: 'short', year: 'numeric' });
const weekFormat = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short' });

const asDate = (day: string) => new Date(`${day.slice(0, 10)}T00:00:00Z`);

/** A calendar date as people read it: "3 Mar 2026". Dates are calendar days, so no zone shifts them. */
const dayWords = (day: string) => dayFormat.format(asDate(day));

/** "Mar 2026" for a month key ("2026-03" or a date in it). */
export const monthWords = (month: string) => shortMonthFormat.format(asDate(`${month.slice(0, 7)}-01`));

/** "Week of 2 Mar" for a week's Monday. */
export const weekWords = (weekStart: string) => `Week of ${weekFormat.format(asDate(weekStart))}`;
export const weekShortWords = (weekStart: string) => weekFormat.format(asDate(weekStart));

/** "March 2026", "2026", or "3 Mar 2026 – 14 Apr 2026". */
export function rangeWords(range: DateRange): string {
  const month = wholeMonthOf(range);
  if (month) return monthFormat.format(asDate(range.from));
  const year = range.from.slice(0, 4);
  if (range.from === `${year}-01-01` && range.to === `${year}-12-31`) return year;
  return `${dayWords(range.from)} – ${dayWords(range.to)}`;
}
