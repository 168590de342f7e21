import type { OpeningSpan } from '../schemas/booth';
import { wallClockIn } from '../time';

const dayNames = ['', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'];

/**
 * Whether a booking from `start` to `end` sits inside one opening span of the booth, read on
 * the shop's wall clock. Null when it does (or the booth has no hours set); otherwise the reason in words.
 */
export function openingHoursProblem(start: Date, end: Date, openingHours: OpeningSpan[], timeZone: string): string | null {
  if (openingHours.length === 0) return null;
  const from = wallClockIn(start, timeZone);
  // The end instant itself may be the closing minute, so judge the last minute of the booking.
  const to = wallClockIn(new Date(end.getTime() - 60_000), timeZone);
  const spans = openingHours.filter((span) => span.weekday === from.isoWeekday);
  if (spans.length === 0) return `The booth is closed on ${dayNames[from.isoWeekday]}s`;
  if (from.date !== to.date) return 'The booking runs past midnight; the booth is not open overnight';
  const fits = spans.some((span) => span.opens <= from.time && to.time < span.closes);
  if (fits) return null;
  const hours = spans.map((span) => `${span.opens}–${span.closes}`).join(', ');
  return `The booking is outside the booth's opening hours on ${dayNames[from.isoWeekday]} (${hours})`;
}
