/** The calendar date (YYYY-MM-DD) of an instant as seen on a wall clock in `timeZone`. */
export function calendarDateIn(instant: Date, timeZone: string): string {
  // en-CA formats dates as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(instant);
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

export function wallClockIn(instant: Date, timeZone: string): WallClock {
  const parts = wallClockFormat(timeZone).formatToParts(instant);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return { date: `${part('year')}-${part('month')}-${part('day')}`, isoWeekday: weekdayNumbers[part('weekday')], time: `${part('hour')}:${part('minute')}` };
}
