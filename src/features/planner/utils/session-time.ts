import { formatShopClock, zoneNearClockChange } from '../../../lib/shop-time';

const dayFormats = new Map<string, Intl.DateTimeFormat>();

function shopDay(at: Date, timeZone: string): string {
  let format = dayFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' });
    dayFormats.set(timeZone, format);
  }
  return format.format(at);
}

/** "Tue 7 Jul 2026, 09:00–10:00"; in the week either side of a clock change "… GMT", to say which side it is. */
export function sessionWhen({ start, end }: { start: string; end: string }, timeZone: string): string {
  const from = new Date(start);
  const to = new Date(end);
  return `${shopDay(from, timeZone)}, ${formatShopClock(from, timeZone)}–${formatShopClock(to, timeZone)}${zoneNearClockChange(from, timeZone)}`;
}
