import { TZDate } from '@date-fns/tz';
import { calendarDateIn, wallClockIn } from '../../shared/time';

/** One working day (Monday to Friday) of the shop, on its own wall clock. */
export interface WorkDay {
  /** Position in the ten-year timeline: ids are laid out by it, so older work has lower ids. */
  index: number;
  date: string;
  /** The instant the shop's day starts (local midnight). No clock change falls on a weekday night. */
  midnightMs: number;
  /** 0…1 through the calendar year, for the seasons in the booth conditions. */
  yearFraction: number;
}

export interface Timeline {
  days: WorkDay[];
  now: Date;
  timeZone: string;
  /** First day of the one-year size; days before it are added when the data grows to ten years. */
  oneYearFrom: number;
  /** The last working day that has begun. */
  todayIndex: number;
}

const dayMs = 86_400_000;
// Ten years of history (this week included), plus next week already planned in the booth calendar.
export const historyWeeks = { oneYear: 52, tenYears: 520 } as const;
const plannedWeeks = 1;

function utcDayOf(date: string): number {
  const [y, m, d] = date.split('-').map(Number);
  return Date.UTC(y, m - 1, d);
}

function workDay(index: number, utcDay: number, timeZone: string): WorkDay {
  const day = new Date(utcDay);
  const midnightMs = new TZDate(day.getUTCFullYear(), day.getUTCMonth(), day.getUTCDate(), 0, 0, 0, timeZone).getTime();
  const yearStart = Date.UTC(day.getUTCFullYear(), 0, 1);
  return { index, date: day.toISOString().slice(0, 10), midnightMs, yearFraction: (utcDay - yearStart) / (365.25 * dayMs) };
}

/** Working days from Monday 519 weeks ago to Friday of next week, on the shop's wall clock. */
export function buildTimeline(now: Date, timeZone: string): Timeline {
  const today = utcDayOf(calendarDateIn(now, timeZone));
  const thisMonday = today - (wallClockIn(now, timeZone).isoWeekday - 1) * dayMs;
  const first = thisMonday - (historyWeeks.tenYears - 1) * 7 * dayMs;
  const weeks = historyWeeks.tenYears + plannedWeeks;
  const days: WorkDay[] = [];
  for (let week = 0; week < weeks; week += 1) {
    for (let weekday = 0; weekday < 5; weekday += 1) days.push(workDay(days.length, first + (week * 7 + weekday) * dayMs, timeZone));
  }
  const todayIndex = days.filter((d) => d.midnightMs <= now.getTime()).length - 1;
  return { days, now, timeZone, oneYearFrom: (weeks - historyWeeks.oneYear - plannedWeeks) * 5, todayIndex };
}

/** A small seeded generator, so every run builds the same shop. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
