import { formatShopClock, shopZoneName } from '../../../lib/shop-time';

const dayFormats = new Map<string, Intl.DateTimeFormat>();

function shopDay(at: Date, timeZone: string): string {
  let format = dayFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' });
    dayFormats.set(timeZone, format);
  }
  return format.format(at);
}

/** "Tue 7 Jul 2026, 09:00–10:00 BST": the zone's short name shows which side of a clock change it is. */
export function sessionWhen({ start, end }: { start: string; end: string }, timeZone: string): string {
  const from = new Date(start);
  const to = new Date(end);
  return `${shopDay(from, timeZone)}, ${formatShopClock(from, timeZone)}–${formatShopClock(to, timeZone)} ${shopZoneName(from, timeZone)}`;
}
