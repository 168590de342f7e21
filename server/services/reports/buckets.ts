import { TZDate } from '@date-fns/tz';
import { addDays, addHours, addMonths, format, startOfMonth, startOfWeek } from 'date-fns';

export type BucketSize = 'hour' | 'day' | 'week' | 'month';

/** One slice of the report's time axis: [startsAt, endsAt) as UTC ISO instants. */
export interface Bucket {
  label: string;
  startsAt: string;
  endsAt: string;
}

function shopMidnight(date: string, timeZone: string): TZDate {
  const [y, m, d] = date.split('-').map(Number);
  return new TZDate(y, m - 1, d, timeZone);
}

const utc = (d: Date) => new Date(d.getTime()).toISOString();

/** The report's range in UTC instants: from the shop's midnight of `from` to the midnight after `to`. */
export function shopRange(from: string, to: string, timeZone: string): { startsAt: string; endsAt: string } {
  return { startsAt: utc(shopMidnight(from, timeZone)), endsAt: utc(addDays(shopMidnight(to, timeZone), 1)) };
}

const step: Record<BucketSize, (d: TZDate) => TZDate> = {
  hour: (d) => addHours(d, 1),
  day: (d) => addDays(d, 1),
  week: (d) => addDays(d, 7),
  month: (d) => addMonths(d, 1),
};

function firstBucket(from: TZDate, size: BucketSize): TZDate {
  if (size === 'week') return startOfWeek(from, { weekStartsOn: 1 });
  if (size === 'month') return startOfMonth(from);
  return from;
}

function labelOf(start: TZDate, size: BucketSize): string {
  if (size === 'hour') return utc(start);
  return format(start, size === 'month' ? 'yyyy-MM' : 'yyyy-MM-dd');
}

/**
 * Buckets covering the range in the shop's calendar: days and weeks start at the shop's
 * midnight (so a DST change gives a 23- or 25-hour day), weeks on Monday, months on the 1st.
 */
export function bucketsFor(from: string, to: string, timeZone: string, size: BucketSize): Bucket[] {
  const end = addDays(shopMidnight(to, timeZone), 1);
  const buckets: Bucket[] = [];
  for (let cursor = firstBucket(shopMidnight(from, timeZone), size); cursor < end; ) {
    const next = step[size](cursor);
    buckets.push({ label: labelOf(cursor, size), startsAt: utc(cursor), endsAt: utc(next) });
    cursor = next;
  }
  return buckets;
}
