import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  findSlot,
  rackBreach,
  type Interval,
  type PlanBooth,
  type RackLoad,
  type SlotContext,
  type Taken,
} from '../../../shared/finishing/auto-plan-slots';
import { openingHoursProblem } from '../../../shared/finishing/opening-hours';
import { sessionMinutes } from '../../../shared/finishing/planning';
import type { OpeningSpan } from '../../../shared/schemas/booth';

// The oracle: the slot search as it was before the sweep, trying every quarter-hour in turn and
// every booth at each. The sweep must find exactly the slot this finds, on every input.
const slotMs = 15 * 60_000;
const overlaps = (a: { start: Date; end: Date }, b: { start: Date; end: Date }) => a.start < b.end && b.start < a.end;
function rackFitsByScan(taken: Taken, capacityM2: number, from: Date, until: Date, areaM2: number): boolean {
  const starts = [from, ...taken.rackLoad.filter((l) => l.from > from && l.from < until).map((l) => l.from)];
  return starts.every(
    (t) =>
      taken.rackLoad.filter((l) => l.from <= t && t < l.until).reduce((sum, l) => sum + l.areaM2, 0) + areaM2 <=
      capacityM2,
  );
}
function findSlotByScan(
  shop: SlotContext,
  taken: Taken,
  earliest: Date,
  areaM2: number,
  footprintM2: number,
  handleMin: number,
): Interval | null {
  const horizon = shop.now.getTime() + shop.horizonDays * 86_400_000;
  for (
    let t = Math.ceil(Math.max(earliest.getTime(), shop.now.getTime()) / slotMs) * slotMs;
    t < horizon;
    t += slotMs
  ) {
    for (const booth of shop.booths) {
      const minutes = sessionMinutes({
        areaM2,
        sprayRateM2PerH: booth.sprayRateM2PerH,
        setupMin: shop.setupMin,
        cleanDownMin: shop.cleanDownMin,
      });
      const slot = { boothId: booth.id, start: new Date(t), end: new Date(t + minutes * 60_000) };
      if (slot.end.getTime() > horizon || openingHoursProblem(slot.start, slot.end, booth.openingHours, shop.timeZone))
        continue;
      if (taken.busy.some((b) => b.boothId === booth.id && overlaps(b, slot))) continue;
      if (
        !rackFitsByScan(
          taken,
          shop.rackCapacityM2,
          slot.end,
          new Date(slot.end.getTime() + handleMin * 60_000),
          footprintM2,
        )
      )
        continue;
      return slot;
    }
  }
  return null;
}

const weekdays = (opens: string, closes: string, days = [1, 2, 3, 4, 5]): OpeningSpan[] =>
  days.map((weekday) => ({ weekday, opens, closes }));
const shop = (overrides: Partial<SlotContext> = {}): SlotContext => ({
  now: new Date('2027-01-04T08:00:00Z'), // a Monday
  horizonDays: 14,
  timeZone: 'UTC',
  setupMin: 15,
  cleanDownMin: 20,
  booths: [{ id: 1, name: 'A', openingHours: weekdays('07:00', '17:00'), sprayRateM2PerH: 24 }],
  rackCapacityM2: 10,
  ...overrides,
});
const iso = (slot: Interval | null) => slot && [slot.boothId, slot.start.toISOString(), slot.end.toISOString()];

describe('findSlot, worked by hand', () => {
  it('starts after a booking that covers the earliest time, on the next quarter-hour', () => {
    // 12 m² at 24 m²/h = 30 min + 15 + 20 = 65 min. Booked 08:00–09:50 → the first start after it is 10:00.
    const taken: Taken = {
      busy: [{ boothId: 1, start: new Date('2027-01-04T08:00:00Z'), end: new Date('2027-01-04T09:50:00Z') }],
      rackLoad: [],
    };
    expect(iso(findSlot(shop(), taken, new Date('2027-01-04T08:00:00Z'), 12, 1, 120))).toEqual([
      1,
      '2027-01-04T10:00:00.000Z',
      '2027-01-04T11:05:00.000Z',
    ]);
  });

  it('waits until the shelves have room for the parts until they can be handled', () => {
    // 9 of 10 m² are on the shelves until 12:00; 2 m² more fit only once they are free, so the session must end at 12:00 or later: 10:55 → the quarter 11:00.
    const taken: Taken = {
      busy: [],
      rackLoad: [{ from: new Date('2027-01-04T06:00:00Z'), until: new Date('2027-01-04T12:00:00Z'), areaM2: 9 }],
    };
    expect(iso(findSlot(shop(), taken, new Date('2027-01-04T08:00:00Z'), 12, 2, 120))).toEqual([
      1,
      '2027-01-04T11:00:00.000Z',
      '2027-01-04T12:05:00.000Z',
    ]);
  });

  it('goes to the next morning when the session no longer fits before closing, and over the weekend', () => {
    expect(iso(findSlot(shop(), { busy: [], rackLoad: [] }, new Date('2027-01-04T16:00:00Z'), 12, 1, 120))).toEqual([
      1,
      '2027-01-05T07:00:00.000Z',
      '2027-01-05T08:05:00.000Z',
    ]);
    expect(iso(findSlot(shop(), { busy: [], rackLoad: [] }, new Date('2027-01-08T16:30:00Z'), 12, 1, 120))).toEqual([
      1,
      '2027-01-11T07:00:00.000Z',
      '2027-01-11T08:05:00.000Z',
    ]);
  });

  it('gives the tie to the booth listed first, and finds nothing past the horizon', () => {
    const two = shop({
      booths: [shop().booths[0], { id: 2, name: 'B', openingHours: weekdays('07:00', '17:00'), sprayRateM2PerH: 48 }],
    });
    expect(iso(findSlot(two, { busy: [], rackLoad: [] }, new Date('2027-01-04T08:00:00Z'), 12, 1, 120))?.[0]).toBe(1);
    expect(
      findSlot(shop({ horizonDays: 1 }), { busy: [], rackLoad: [] }, new Date('2027-01-04T16:30:00Z'), 12, 1, 120),
    ).toBeNull();
  });

  it('names the latest moment the shelves would overflow', () => {
    const loads: RackLoad[] = [
      { from: new Date('2027-01-04T09:00:00Z'), until: new Date('2027-01-04T10:00:00Z'), areaM2: 8 },
      { from: new Date('2027-01-04T11:00:00Z'), until: new Date('2027-01-04T12:00:00Z'), areaM2: 9 },
    ];
    const at = (text: string) => Date.parse(text);
    expect(rackBreach(loads, 10, at('2027-01-04T08:00:00Z'), at('2027-01-04T13:00:00Z'), 2)).toBe(
      at('2027-01-04T11:00:00Z'),
    );
    expect(rackBreach(loads, 10, at('2027-01-04T08:00:00Z'), at('2027-01-04T10:30:00Z'), 2)).toBeNull();
  });
});

// Zones with a clock change in the fortnight (London and New York in March, Lord Howe's half-hour
// change in April), offsets of half and three quarters of an hour, and UTC.
const zones = [
  'UTC',
  'Europe/London',
  'America/New_York',
  'Australia/Lord_Howe',
  'Asia/Kolkata',
  'Asia/Kathmandu',
  'America/St_Johns',
];
const starts = [
  '2027-01-04T06:00:00Z',
  '2027-03-08T05:00:00Z',
  '2027-03-22T10:00:00Z',
  '2027-03-30T13:00:00Z',
  '2027-10-25T00:00:00Z',
];
const clock = fc
  .integer({ min: 0, max: 95 })
  .map((q) => `${String(Math.floor(q / 4)).padStart(2, '0')}:${String((q % 4) * 15).padStart(2, '0')}`);
const span = fc
  .record({ weekday: fc.integer({ min: 1, max: 7 }), opens: clock, closes: clock })
  .filter((s) => s.opens < s.closes);
const booth = (id: number) =>
  fc.record({
    id: fc.constant(id),
    name: fc.constant(`B${id}`),
    openingHours: fc.oneof(fc.constant([]), fc.constant(weekdays('07:00', '17:00')), fc.array(span, { maxLength: 6 })),
    sprayRateM2PerH: fc.integer({ min: 5, max: 60 }),
  });
const minutes = (max: number) => fc.integer({ min: 0, max });

describe('findSlot against the quarter-hour scan', () => {
  it('finds the same slot on varied shops, bookings, shelves and clock changes', () => {
    const scenario = fc.record({
      zone: fc.constantFrom(...zones),
      start: fc.constantFrom(...starts),
      booths: fc
        .integer({ min: 1, max: 3 })
        .chain((n) => fc.tuple(...Array.from({ length: n }, (_, i) => booth(i + 1)))),
      busy: fc.array(
        fc.record({
          boothId: fc.integer({ min: 1, max: 3 }),
          at: minutes(14 * 24 * 60),
          length: fc.integer({ min: 5, max: 600 }),
        }),
        { maxLength: 25 },
      ),
      loads: fc.array(
        fc.record({
          at: minutes(14 * 24 * 60),
          length: fc.integer({ min: 5, max: 1200 }),
          areaM2: fc.integer({ min: 1, max: 40 }).map((n) => n / 4),
        }),
        { maxLength: 20 },
      ),
      capacityM2: fc.integer({ min: 2, max: 40 }),
      earliestMin: minutes(3 * 24 * 60 + 7),
      areaM2: fc.integer({ min: 0, max: 60 }),
      footprintM2: fc.integer({ min: 0, max: 16 }).map((n) => n / 2),
      handleMin: fc.integer({ min: 0, max: 600 }),
    });
    fc.assert(
      fc.property(scenario, (s) => {
        const now = new Date(s.start);
        const plus = (min: number) => new Date(now.getTime() + min * 60_000);
        const context: SlotContext = {
          now,
          horizonDays: 14,
          timeZone: s.zone,
          setupMin: 15,
          cleanDownMin: 20,
          booths: s.booths as PlanBooth[],
          rackCapacityM2: s.capacityM2,
        };
        const taken: Taken = {
          busy: s.busy.map((b) => ({ boothId: b.boothId, start: plus(b.at), end: plus(b.at + b.length) })),
          rackLoad: s.loads.map((l) => ({ from: plus(l.at), until: plus(l.at + l.length), areaM2: l.areaM2 })),
        };
        const args = [context, taken, plus(s.earliestMin), s.areaM2, s.footprintM2, s.handleMin] as const;
        expect(iso(findSlot(...args))).toEqual(iso(findSlotByScan(...args)));
      }),
      { numRuns: 200, seed: 20270104 },
    );
    // The oracle scans every quarter-hour of the fortnight: slow by design, so a generous limit.
  }, 60_000);
});
