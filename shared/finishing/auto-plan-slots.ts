import type { OpeningSpan } from '../schemas/booth';
import { wallClockIn } from '../time';
import { openingHoursProblem } from './opening-hours';
import { sessionMinutes } from './planning';

export type PlanBooth = { id: number; name: string; openingHours: OpeningSpan[]; sprayRateM2PerH: number };
export type Interval = { boothId: number; start: Date; end: Date };
export type RackLoad = { from: Date; until: Date; areaM2: number };

/** What the slot search needs to know about the shop. */
export type SlotContext = {
  now: Date;
  horizonDays: number;
  timeZone: string;
  setupMin: number;
  cleanDownMin: number;
  booths: PlanBooth[];
  rackCapacityM2: number;
};

/** Booth time and shelf space taken so far, by bookings and by the plan as it grows. */
export type Taken = { busy: Interval[]; rackLoad: RackLoad[] };

/** Sessions start on the quarter-hour (of UTC, so also of every zone whose offset is whole quarters). */
const slotMs = 15 * 60_000;
const minuteMs = 60_000;
const ceilToSlot = (t: number) => Math.ceil(t / slotMs) * slotMs;
/** The first quarter-hour strictly after `t`. */
const slotAfter = (t: number) => Math.floor(t / slotMs) * slotMs + slotMs;

/** One booth's search: its session length, its bookings sorted by start, and the shop's bounds. */
type BoothSearch = { shop: SlotContext; booth: PlanBooth; busy: Bookings; sessionMs: number; horizon: number };
/** Where the shelves stand: the loads and the footprint and drying time of the parts to place. */
type RackNeed = { loads: RackLoad[]; capacityM2: number; footprintM2: number; handleMs: number };

/**
 * The latest moment in [from, until) at which the shelves would hold more than their capacity
 * with `areaM2` more on them; null when they never would. The load peaks at `from` or at a load's
 * start, so only those moments are looked at, and only loads that touch the interval are summed
 * (in their given order, so the sums are the same to the last bit as summing all of them).
 */
export function rackBreach(
  loads: RackLoad[],
  capacityM2: number,
  from: number,
  until: number,
  areaM2: number,
): number | null {
  const near = loads.filter((l) => l.from.getTime() < until && l.until.getTime() > from);
  const moments = [from, ...near.map((l) => l.from.getTime()).filter((t) => t > from && t < until)].sort(
    (a, b) => b - a,
  );
  for (const t of moments) {
    const held = near
      .filter((l) => l.from.getTime() <= t && t < l.until.getTime())
      .reduce((sum, l) => sum + l.areaM2, 0);
    if (held + areaM2 > capacityM2) return t;
  }
  return null;
}

/** A booth's bookings sorted by start, with the latest end among each and those before it. */
type Bookings = { starts: number[]; latestEnd: number[] };

function bookingsOf(busy: Interval[], boothId: number): Bookings {
  const mine = busy.filter((b) => b.boothId === boothId).sort((a, b) => a.start.getTime() - b.start.getTime());
  const latestEnd: number[] = [];
  for (const b of mine) latestEnd.push(Math.max(latestEnd.at(-1) ?? -Infinity, b.end.getTime()));
  return { starts: mine.map((b) => b.start.getTime()), latestEnd };
}

/** The latest end among the bookings that overlap [start, end), or null when none does. */
function clashEnd({ starts, latestEnd }: Bookings, start: number, end: number): number | null {
  // How many bookings start before `end` (binary search); of those, any ending after `start` clashes.
  let low = 0;
  let high = starts.length;
  while (low < high) {
    const mid = (low + high) >> 1;
    if (starts[mid] < end) low = mid + 1;
    else high = mid;
  }
  return low > 0 && latestEnd[low - 1] > start ? latestEnd[low - 1] : null;
}

const minuteOfDay = (time: string) => Number(time.slice(0, 2)) * 60 + Number(time.slice(3, 5));
/** Minutes the shop's wall clock is ahead of UTC at `t`. */
function offsetMin(t: number, timeZone: string): number {
  const wall = wallClockIn(new Date(t), timeZone);
  return Math.round((Date.parse(`${wall.date}T${wall.time}:00Z`) - Math.floor(t / minuteMs) * minuteMs) / minuteMs);
}

/**
 * After a start at `t` fell outside opening hours: the next start worth trying. No later start on
 * the same day can fit until the next span of that day opens (a later start in the span `t` is
 * in ends later still), so it jumps to that opening, or to midnight. Across a clock change the
 * wall clock and real time part, so it steps one quarter-hour instead.
 */
function nextOpeningTry(search: BoothSearch, t: number): number {
  const { timeZone } = search.shop;
  const wall = wallClockIn(new Date(t), timeZone);
  const now = minuteOfDay(wall.time);
  const opens = search.booth.openingHours.filter((s) => s.weekday === wall.isoWeekday).map((s) => minuteOfDay(s.opens));
  const target = Math.min(24 * 60, ...opens.filter((m) => m > now));
  const jumpTo = t + (target - now) * minuteMs;
  if (offsetMin(t, timeZone) !== offsetMin(jumpTo, timeZone)) return t + slotMs;
  return Math.max(t + slotMs, ceilToSlot(jumpTo));
}

/**
 * The booth's earliest quarter-hour start from `t` that is open, free and leaves rack space, before
 * `stopAt` (a start another booth already has). Each failed check jumps past every start that
 * must fail for the same reason: past the clashing booking, past the moment the shelves are full,
 * to the next opening.
 */
function earliestOnBooth(search: BoothSearch, rack: RackNeed, from: number, stopAt: number): number | null {
  const { shop, booth, busy, sessionMs, horizon } = search;
  for (let t = from; t < Math.min(horizon, stopAt);) {
    const end = t + sessionMs;
    if (end > horizon) return null;
    // The cheap check first: a clash jumps past the booking without reading the wall clock.
    const clash = clashEnd(busy, t, end);
    if (clash !== null) {
      t = Math.max(t + slotMs, ceilToSlot(clash));
      continue;
    }
    if (openingHoursProblem(new Date(t), new Date(end), booth.openingHours, shop.timeZone)) {
      t = nextOpeningTry(search, t);
      continue;
    }
    const full = rackBreach(rack.loads, rack.capacityM2, end, end + rack.handleMs, rack.footprintM2);
    if (full === null) return t;
    // A start whose session ends at or before the full moment still has it on the shelves.
    t = Math.max(t + slotMs, slotAfter(full - sessionMs));
  }
  return null;
}

// Each booth turns the area into its own session length at its spray rate.
function sessionMinutesFor(shop: SlotContext, booth: PlanBooth, areaM2: number): number {
  return sessionMinutes({
    areaM2,
    sprayRateM2PerH: booth.sprayRateM2PerH,
    setupMin: shop.setupMin,
    cleanDownMin: shop.cleanDownMin,
  });
}

/**
 * The earliest booth slot from `earliest` that is open, free, and leaves rack space until handling:
 * the earliest quarter-hour any booth can take, the booth listed first on a tie.
 */
export function findSlot(
  shop: SlotContext,
  taken: Taken,
  earliest: Date,
  areaM2: number,
  footprintM2: number,
  handleMin: number,
): Interval | null {
  const horizon = shop.now.getTime() + shop.horizonDays * 86_400_000;
  const from = ceilToSlot(Math.max(earliest.getTime(), shop.now.getTime()));
  const rack: RackNeed = {
    loads: taken.rackLoad,
    capacityM2: shop.rackCapacityM2,
    footprintM2,
    handleMs: handleMin * minuteMs,
  };
  let best: Interval | null = null;
  for (const booth of shop.booths) {
    const search: BoothSearch = {
      shop,
      booth,
      busy: bookingsOf(taken.busy, booth.id),
      sessionMs: sessionMinutesFor(shop, booth, areaM2) * minuteMs,
      horizon,
    };
    const start = earliestOnBooth(search, rack, from, best ? best.start.getTime() : Infinity);
    if (start !== null) best = { boothId: booth.id, start: new Date(start), end: new Date(start + search.sessionMs) };
  }
  return best;
}
