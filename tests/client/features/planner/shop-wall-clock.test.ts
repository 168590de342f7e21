import { describe, expect, it } from 'vitest';
import { businessHoursFor } from '../../../../src/features/planner/utils/business-hours';
import { mondayOf, rangeTitle, visibleRange } from '../../../../src/features/planner/utils/calendar-range';
import { fromShopInputValue, offsetForWallClock, shopWallToInstant, toShopInputValue, wallClockArray } from '../../../../src/features/planner/utils/shop-wall-clock';

// Offsets checked against the IANA tz database rules for Europe/London (GMT in winter, BST = UTC+1
// from the last Sunday of March 01:00 UTC to the last Sunday of October 01:00 UTC) and
// America/New_York (EST UTC−5, EDT UTC−4).
describe('shop wall clock', () => {
  it('reads 09:00 in a London summer as 08:00 UTC, and in winter as 09:00 UTC', () => {
    expect(shopWallToInstant('2026-07-07', '09:00', 'Europe/London').toISOString()).toBe('2026-07-07T08:00:00.000Z');
    expect(shopWallToInstant('2026-01-13', '09:00', 'Europe/London').toISOString()).toBe('2026-01-13T09:00:00.000Z');
  });

  it('gives the zone offset for a wall-clock reading either side of a clock change', () => {
    expect(offsetForWallClock([2026, 2, 29, 0, 30, 0, 0], 'Europe/London')).toBe(0);
    expect(offsetForWallClock([2026, 2, 29, 3, 0, 0, 0], 'Europe/London')).toBe(60);
    expect(offsetForWallClock([2026, 6, 7, 9, 0, 0, 0], 'America/New_York')).toBe(-240);
    expect(offsetForWallClock([2026, 0, 7, 9, 0, 0, 0], 'America/New_York')).toBe(-300);
  });

  it('reads an instant back to the wall clock it came from', () => {
    expect(wallClockArray(Date.parse('2026-10-25T00:30:00Z'), 'Europe/London')).toEqual([2026, 9, 25, 1, 30, 0, 0]);
    expect(wallClockArray(Date.parse('2026-10-25T01:30:00Z'), 'Europe/London')).toEqual([2026, 9, 25, 1, 30, 0, 0]);
  });

  it('round-trips a datetime-local value on the shop clock', () => {
    expect(toShopInputValue('2026-07-07T08:00:00.000Z', 'Europe/London')).toBe('2026-07-07T09:00');
    expect(fromShopInputValue('2026-07-07T09:00', 'Europe/London')).toBe('2026-07-07T08:00:00.000Z');
    expect(fromShopInputValue('2026-07-07', 'Europe/London')).toBe('');
  });
});

describe('calendar range', () => {
  it('starts the week on Monday and asks for shop midnight to shop midnight', () => {
    expect(mondayOf('2026-07-12')).toBe('2026-07-06');
    expect(mondayOf('2026-07-06')).toBe('2026-07-06');
    expect(visibleRange('week', '2026-07-08', 'Europe/London')).toEqual({ from: '2026-07-05T23:00:00.000Z', to: '2026-07-12T23:00:00.000Z' });
    expect(visibleRange('day', '2026-01-13', 'Europe/London')).toEqual({ from: '2026-01-13T00:00:00.000Z', to: '2026-01-14T00:00:00.000Z' });
  });

  it('titles the week and the day in words', () => {
    expect(rangeTitle('week', '2026-07-08')).toBe('Week of 6 Jul – 12 Jul 2026');
    expect(rangeTitle('day', '2026-07-07')).toMatch(/^Tuesday,? 7 July 2026$/);
  });
});

describe('business hours', () => {
  it('turns ISO weekdays into the calendar’s, Sunday being 0', () => {
    expect(businessHoursFor([[{ weekday: 7, opens: '08:00', closes: '12:00' }]])).toEqual([{ daysOfWeek: [0], startTime: '08:00', endTime: '12:00' }]);
  });

  it('shades nothing when a booth shown has no hours, as it may be booked at any time', () => {
    expect(businessHoursFor([[{ weekday: 1, opens: '07:00', closes: '17:00' }], []])).toBe(false);
  });
});
