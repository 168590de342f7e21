import { describe, expect, it } from 'vitest';
import { formatHours, formatMinutes } from '../../../src/lib/durations';

describe('formatMinutes', () => {
  it('reads short times in minutes, then hours and minutes, then days and hours', () => {
    expect(formatMinutes(44.6)).toBe('45 min');
    expect(formatMinutes(60)).toBe('1 h');
    expect(formatMinutes(200)).toBe('3 h 20 min');
    expect(formatMinutes(2880)).toBe('2 d');
    expect(formatMinutes(3125)).toBe('2 d 4 h');
  });

  it('shows a dash for a time that is not a number', () => {
    expect(formatMinutes(Number.NaN)).toBe('—');
  });
});

describe('formatHours', () => {
  it('adds days to a long full-cure time', () => {
    expect(formatHours(24)).toBe('24 h');
    expect(formatHours(168)).toBe('168 h (7 days)');
  });
});

