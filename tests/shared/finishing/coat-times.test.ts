import { tz } from '@date-fns/tz';
import { format } from 'date-fns';
import { describe, expect, it } from 'vitest';
import { coatTimes } from '../../../shared/finishing/coat-times';
import type { DryingTimes } from '../../../shared/finishing/drying-times';

const times: DryingTimes = {
  flashOffMin: 10,
  recoatMinMin: 240,
  recoatMaxMin: 600,
  touchDryMin: 30,
  handleMin: 180,
  packMin: 480,
  fullCureH: 168,
};

const london = tz('Europe/London');
// Wall clock and offset as a London shop reads them, by date-fns with @date-fns/tz.
const wallClock = (at: Date | null) => (at ? format(at, 'yyyy-MM-dd HH:mm xxx', { in: london }) : null);
// Second, independent reading of the same instant with the runtime's Intl time-zone data.
const intlWallClock = (at: Date) =>
  new Intl.DateTimeFormat('en-GB', {
    timeZone: 'Europe/London',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).format(at);

describe('coatTimes', () => {
  it('adds each drying time to the moment of spraying', () => {
    const sprayedAt = new Date('2025-06-10T08:00:00Z');
    const result = coatTimes(sprayedAt, times);
    expect(result.flashOffEndsAt.toISOString()).toBe('2025-06-10T08:10:00.000Z');
    expect(result.recoatOpensAt.toISOString()).toBe('2025-06-10T12:00:00.000Z');
    expect(result.recoatClosesAt?.toISOString()).toBe('2025-06-10T18:00:00.000Z');
    expect(result.touchDryAt.toISOString()).toBe('2025-06-10T08:30:00.000Z');
    expect(result.handleAt.toISOString()).toBe('2025-06-10T11:00:00.000Z');
    expect(result.packAt.toISOString()).toBe('2025-06-10T16:00:00.000Z');
    expect(result.fullCureAt.toISOString()).toBe('2025-06-17T08:00:00.000Z');
  });

  it('never closes the window when the data sheet gives no latest recoat time', () => {
    expect(coatTimes(new Date('2025-06-10T08:00:00Z'), { ...times, recoatMaxMin: null }).recoatClosesAt).toBeNull();
  });

  // UK clocks change at 01:00 UTC on the last Sunday of March and of October (Summer Time Order,
  // aligned with EU Directive 2000/84/EC; rule from memory). In 2025 those Sundays are 30 March and 26 October.
  it('keeps real elapsed time across the October clock change in London', () => {
    const sprayedAt = new Date('2025-10-25T22:00:00Z');
    expect(wallClock(sprayedAt)).toBe('2025-10-25 23:00 +01:00');
    const result = coatTimes(sprayedAt, times);
    // 4 h after 23:00 BST is 02:00 GMT, not the 03:00 a wall-clock sum would give.
    expect(wallClock(result.recoatOpensAt)).toBe('2025-10-26 02:00 +00:00');
    // 3 h after 23:00 BST lands on the repeated hour: 01:00 GMT, the second 01:00 of the night.
    expect(wallClock(result.handleAt)).toBe('2025-10-26 01:00 +00:00');
    expect(wallClock(result.recoatClosesAt)).toBe('2025-10-26 08:00 +00:00');
    // A week of cure ends at 22:00 GMT, an hour earlier on the clock than it started.
    expect(wallClock(result.fullCureAt)).toBe('2025-11-01 22:00 +00:00');
    expect(intlWallClock(result.recoatOpensAt)).toBe('26/10/2025, 02:00');
  });

  it('keeps real elapsed time across the March clock change in London', () => {
    const sprayedAt = new Date('2025-03-29T23:30:00Z');
    expect(wallClock(sprayedAt)).toBe('2025-03-29 23:30 +00:00');
    const result = coatTimes(sprayedAt, { ...times, recoatMinMin: 180, fullCureH: 24 });
    // 3 h after 23:30 GMT is 03:30 BST; 02:30 does not exist on that night.
    expect(wallClock(result.recoatOpensAt)).toBe('2025-03-30 03:30 +01:00');
    expect(intlWallClock(result.recoatOpensAt)).toBe('30/03/2025, 03:30');
    // 24 h of cure ends at 00:30 BST the next day, not at 23:30.
    expect(wallClock(result.fullCureAt)).toBe('2025-03-31 00:30 +01:00');
  });

  it('refuses an invalid spraying time, naming the field', () => {
    expect(() => coatTimes(new Date('not a date'), times)).toThrow(expect.objectContaining({ field: 'sprayedAt' }));
  });
});
