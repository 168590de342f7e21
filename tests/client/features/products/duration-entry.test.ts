import { describe, expect, it } from 'vitest';
import { amountText, durationUnitFor, typedMinutes } from '../../../../src/features/products/components/duration-entry';

describe('drying times typed in minutes or hours', () => {
  it('stores a 16 h recoat typed as 16 hours as 960 minutes', () => {
    expect(typedMinutes('16', 'h')).toBe(960);
    expect(typedMinutes('16', 'min')).toBe(16);
  });

  it('takes decimal hours, with a point or a comma, as whole hundredths of a minute', () => {
    expect(typedMinutes('1.5', 'h')).toBe(90);
    expect(typedMinutes('1,5', 'h')).toBe(90);
    expect(typedMinutes('0.1', 'h')).toBe(6);
    expect(typedMinutes('0.33', 'h')).toBe(19.8);
  });

  it('leaves a blank or unreadable box blank, for the form to ask for it', () => {
    expect(typedMinutes('', 'h')).toBeUndefined();
    expect(typedMinutes('  ', 'min')).toBeUndefined();
    expect(typedMinutes('abc', 'h')).toBeUndefined();
  });

  it('shows a stored time back in the unit that reads best', () => {
    expect(durationUnitFor(960)).toBe('h');
    expect(amountText(960, 'h')).toBe('16');
    expect(durationUnitFor(90)).toBe('h');
    expect(amountText(90, 'h')).toBe('1.5');
    expect(durationUnitFor(60)).toBe('h');
    expect(durationUnitFor(45)).toBe('min');
    expect(durationUnitFor(100)).toBe('min');
    expect(amountText(100, 'min')).toBe('100');
    expect(durationUnitFor(0)).toBe('min');
    expect(durationUnitFor(null)).toBe('min');
    expect(amountText(null, 'h')).toBe('');
  });

  it('reads back what it stored, whichever unit it was typed in', () => {
    for (const [text, unit] of [['16', 'h'], ['2.5', 'h'], ['45', 'min'], ['1440', 'min']] as const) {
      const minutes = typedMinutes(text, unit)!;
      expect(typedMinutes(amountText(minutes, durationUnitFor(minutes)), durationUnitFor(minutes))).toBe(minutes);
    }
  });
});
