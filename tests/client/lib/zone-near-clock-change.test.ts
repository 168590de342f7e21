import { describe, expect, it } from 'vitest';
import { zoneNearClockChange } from '../../../src/lib/shop-time';

// UK summer time runs from 01:00 UTC on the last Sunday of March to 01:00 UTC on the last Sunday
// of October (Summer Time Order 2002, following EU Directive 2000/84/EC): in 2026, 29 March and 25 October.
describe('zoneNearClockChange', () => {
  it('names no zone far from a clock change', () => {
    expect(zoneNearClockChange(new Date('2026-07-07T08:00:00Z'), 'Europe/London')).toBe('');
    expect(zoneNearClockChange(new Date('2026-12-01T09:00:00Z'), 'Europe/London')).toBe('');
  });

  it('names the zone in the week either side of a change, on each side', () => {
    expect(zoneNearClockChange(new Date('2026-03-27T09:00:00Z'), 'Europe/London')).toBe(' GMT');
    expect(zoneNearClockChange(new Date('2026-03-30T08:00:00Z'), 'Europe/London')).toBe(' BST');
    expect(zoneNearClockChange(new Date('2026-10-23T08:00:00Z'), 'Europe/London')).toBe(' BST');
    expect(zoneNearClockChange(new Date('2026-10-26T09:00:00Z'), 'Europe/London')).toBe(' GMT');
  });

  it('names nothing in a zone without summer time', () => {
    expect(zoneNearClockChange(new Date('2026-03-29T09:00:00Z'), 'Asia/Tokyo')).toBe('');
  });
});
