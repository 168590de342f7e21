// Building a formatter costs far more than formatting with one: keep one per zone.
const calendarDateFormats = new Map<string, Intl.DateTimeFormat>();

/** The calendar date (YYYY-MM-DD) of an instant as seen on a wall clock in `timeZone`. */
export function calendarDateIn(instant: Date, timeZone: string): string {
  let format = calendarDateFormats.get(timeZone);
  if (!format) {
    // en-CA formats dates as YYYY-MM-DD.
    format = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    calendarDateFormats.set(timeZone, format);
  }
  return format.format(instant);
}

const weekdayNumbers: Record<string, number> = { Mon: 1, Tue: 2, Wed: 3, Thu: 4, Fri: 5, Sat: 6, Sun: 7 };

export interface WallClock {
  /** YYYY-MM-DD on the wall calendar. */
  date: string;
  /** ISO weekday, 1 = Monday … 7 = Sunday. */
  isoWeekday: number;
  /** 24-hour HH:MM on the wall clock. */
  time: string;
}

/** What a wall clock and calendar in `timeZone` show at `instant` (DST included, via the platform's zone data). */
// Building a formatter is far slower than using one; the planner reads the wall clock thousands of times.
const wallClockFormats = new Map<string, Intl.DateTimeFormat>();
function wallClockFormat(timeZone: string): Intl.DateTimeFormat {
  let format = wallClockFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit', weekday: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
    wallClockFormats.set(timeZone, format);
  }
  return format;
}

function readWallClock(instant: Date, timeZone: string): WallClock {
  const parts = wallClockFormat(timeZone).formatToParts(instant);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return Object.freeze({ date: `${part('year')}-${part('month')}-${part('day')}`, isoWeekday: weekdayNumbers[part('weekday')], time: `${part('hour')}:${part('minute')}` });
}

// The planner asks about the same quarter-hours again and again while it tries slots; the answer
// for a whole UTC minute never changes (zones' offsets are whole minutes), so keep it.
const wallClockCache = new Map<string, WallClock>();
const wallClockCacheLimit = 50_000;

export function wallClockIn(instant: Date, timeZone: string): WallClock {
  const key = `${timeZone}|${Math.floor(instant.getTime() / 60_000)}`;
  let clock = wallClockCache.get(key);
  if (!clock) {
    if (wallClockCache.size >= wallClockCacheLimit) wallClockCache.clear();
    clock = readWallClock(instant, timeZone);
    wallClockCache.set(key, clock);
  }
  return clock;
}
