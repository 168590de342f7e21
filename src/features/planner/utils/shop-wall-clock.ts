/**
 * Wall-clock sums in the shop's timezone from the browser's own zone data (Intl), so the planner
 * shows and books shop time on any device, DST included, without a date library.
 * A "wall-clock array" is [year, monthIndex, day, hour, minute, second, millisecond].
 */
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-GB', {
      timeZone,
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
      hourCycle: 'h23',
    });
    formatters.set(timeZone, formatter);
  }
  return formatter;
}

export function wallClockArray(ms: number, timeZone: string): number[] {
  const parts = formatterFor(timeZone).formatToParts(new Date(ms));
  const part = (type: Intl.DateTimeFormatPartTypes) => Number(parts.find((p) => p.type === type)?.value ?? 0);
  return [part('year'), part('month') - 1, part('day'), part('hour'), part('minute'), part('second'), ((ms % 1000) + 1000) % 1000];
}

const asUtc = (a: number[]) => Date.UTC(a[0], a[1] ?? 0, a[2] ?? 1, a[3] ?? 0, a[4] ?? 0, a[5] ?? 0, a[6] ?? 0);

/** Minutes the zone is ahead of UTC at that instant (+60 for London in summer). */
function offsetAt(ms: number, timeZone: string): number {
  return (asUtc(wallClockArray(ms, timeZone)) - ms) / 60_000;
}

/**
 * The zone's offset for a wall-clock reading. Guess with the offset at the same digits read as UTC,
 * then correct once: that settles every reading except the skipped hour of a spring-forward night.
 */
export function offsetForWallClock(wall: number[], timeZone: string): number {
  const guess = offsetAt(asUtc(wall), timeZone);
  return offsetAt(asUtc(wall) - guess * 60_000, timeZone);
}

/** The instant a shop clock shows `date` (YYYY-MM-DD) at `time` (HH:MM). */
export function shopWallToInstant(date: string, time: string, timeZone: string): Date {
  const [year, month, day] = date.split('-').map(Number);
  const [hour, minute] = time.split(':').map(Number);
  const wall = [year, month - 1, day, hour, minute, 0, 0];
  return new Date(asUtc(wall) - offsetForWallClock(wall, timeZone) * 60_000);
}

const pad = (n: number) => String(n).padStart(2, '0');

/** "2026-07-07T09:00": what a datetime-local input shows for an instant, on the shop's clock. */
export function toShopInputValue(iso: string, timeZone: string): string {
  const ms = Date.parse(iso);
  if (Number.isNaN(ms)) return '';
  const [y, mo, d, h, mi] = wallClockArray(ms, timeZone);
  return `${y}-${pad(mo + 1)}-${pad(d)}T${pad(h)}:${pad(mi)}`;
}

/** The ISO instant (UTC) for a datetime-local value read on the shop's clock; '' when it is not a full date and time. */
export function fromShopInputValue(value: string, timeZone: string): string {
  const match = /^(\d{4}-\d{2}-\d{2})T(\d{2}:\d{2})/.exec(value);
  if (!match) return '';
  return shopWallToInstant(match[1], match[2], timeZone).toISOString();
}
