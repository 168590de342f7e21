import { describe, expect, it } from 'vitest';
import { bucketsFor, shopRange } from '../../../server/services/reports/buckets';

// UK clock changes, 2025: BST began 01:00 UTC Sunday 30 March and ended 01:00 UTC Sunday
// 26 October (the Summer Time Order's rule: last Sunday of March and of October).
describe('report buckets in shop time', () => {
  it('makes the spring-forward day 23 hours long and the autumn day 25', () => {
    const [spring] = bucketsFor('2025-03-30', '2025-03-30', 'Europe/London', 'day');
    expect(spring).toEqual({ label: '2025-03-30', startsAt: '2025-03-30T00:00:00.000Z', endsAt: '2025-03-30T23:00:00.000Z' });
    const [autumn] = bucketsFor('2025-10-26', '2025-10-26', 'Europe/London', 'day');
    expect(autumn).toEqual({ label: '2025-10-26', startsAt: '2025-10-25T23:00:00.000Z', endsAt: '2025-10-27T00:00:00.000Z' });
  });

  it('starts weeks on the shop’s Monday, before the range if need be', () => {
    const weeks = bucketsFor('2025-03-26', '2025-04-01', 'Europe/London', 'week');
    expect(weeks.map((w) => w.label)).toEqual(['2025-03-24', '2025-03-31']);
    expect(weeks[1].startsAt).toBe('2025-03-30T23:00:00.000Z');
  });

  it('starts months on the 1st in the shop’s zone', () => {
    const months = bucketsFor('2025-01-15', '2025-03-02', 'America/New_York', 'month');
    expect(months.map((m) => [m.label, m.startsAt])).toEqual([
      ['2025-01', '2025-01-01T05:00:00.000Z'],
      ['2025-02', '2025-02-01T05:00:00.000Z'],
      ['2025-03', '2025-03-01T05:00:00.000Z'],
    ]);
  });

  it('covers whole shop days from the first midnight to the midnight after the last day', () => {
    expect(shopRange('2025-07-01', '2025-07-31', 'Europe/London')).toEqual({ startsAt: '2025-06-30T23:00:00.000Z', endsAt: '2025-07-31T23:00:00.000Z' });
  });
});
