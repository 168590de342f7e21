import type { OpeningSpan } from '../schemas/booth';
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

const slotMs = 15 * 60_000;
const ceilToSlot = (t: number) => Math.ceil(t / slotMs) * slotMs;
const overlaps = (a: { start: Date; end: Date }, b: { start: Date; end: Date }) => a.start < b.end && b.start < a.end;

function rackFits(taken: Taken, capacityM2: number, from: Date, until: Date, areaM2: number): boolean {
  // Peak load over the interval is reached at one of the loads' starts (or at `from`).
  const starts = [from, ...taken.rackLoad.filter((l) => l.from > from && l.from < until).map((l) => l.from)];
  return starts.every((t) => taken.rackLoad.filter((l) => l.from <= t && t < l.until).reduce((sum, l) => sum + l.areaM2, 0) + areaM2 <= capacityM2);
}

// Each booth turns the area into its own session length at its spray rate.
function sessionMinutesFor(shop: SlotContext, booth: PlanBooth, areaM2: number): number {
  return sessionMinutes({ areaM2, sprayRateM2PerH: booth.sprayRateM2PerH, setupMin: shop.setupMin, cleanDownMin: shop.cleanDownMin });
}

/** The earliest booth slot from `earliest` that is open, free, and leaves rack space until handling. */
export function findSlot(shop: SlotContext, taken: Taken, earliest: Date, areaM2: number, footprintM2: number, handleMin: number): Interval | null {
  const horizon = shop.now.getTime() + shop.horizonDays * 86_400_000;
  for (let t = ceilToSlot(Math.max(earliest.getTime(), shop.now.getTime())); t < horizon; t += slotMs) {
    for (const booth of shop.booths) {
      const slot = { boothId: booth.id, start: new Date(t), end: new Date(t + sessionMinutesFor(shop, booth, areaM2) * 60_000) };
      if (slot.end.getTime() > horizon || openingHoursProblem(slot.start, slot.end, booth.openingHours, shop.timeZone)) continue;
      if (taken.busy.some((b) => b.boothId === booth.id && overlaps(b, slot))) continue;
      if (!rackFits(taken, shop.rackCapacityM2, slot.end, new Date(slot.end.getTime() + handleMin * 60_000), footprintM2)) continue;
      return slot;
    }
  }
  return null;
}
