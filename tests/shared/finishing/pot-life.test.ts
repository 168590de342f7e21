import { describe, expect, it } from 'vitest';
import { mixTimes } from '../../../shared/finishing/pot-life';

const mixedAt = new Date('2025-05-12T07:30:00Z');
const minutesAfterMix = (at: Date) => (at.getTime() - mixedAt.getTime()) / 60_000;

describe('mixTimes', () => {
  it('uses the data sheet times at the data sheet temperature, still labelled as an estimate', () => {
    const result = mixTimes({ mixedAt, inductionMin: 15, potLifeMin: 240, refTempC: 20, tempC: 20 });
    expect(minutesAfterMix(result.inductionEndsAt)).toBe(15);
    expect(minutesAfterMix(result.potLifeEndsAt)).toBe(240);
    expect(result.isEstimate).toBe(true);
    expect(result.note).toMatch(/Estimate/);
  });

  it('halves pot life 10 °C warmer and doubles it 10 °C colder', () => {
    // Common practice, no primary source. Secondary: an epoxy FAQ (experts123), pot life doubles for every
    // 18 °F (10 °C) below 77 °F; en1.nbchao.com on cure times. Exact arithmetic, so a float tolerance only.
    const warm = mixTimes({ mixedAt, inductionMin: 20, potLifeMin: 240, refTempC: 20, tempC: 30 });
    expect(minutesAfterMix(warm.potLifeEndsAt)).toBeCloseTo(120, 9);
    expect(minutesAfterMix(warm.inductionEndsAt)).toBeCloseTo(10, 9);
    const cold = mixTimes({ mixedAt, inductionMin: 20, potLifeMin: 240, refTempC: 20, tempC: 10 });
    expect(minutesAfterMix(cold.potLifeEndsAt)).toBeCloseTo(480, 9);
    expect(cold.note).toMatch(/scaled/);
  });

  it('warns at 80 % of the pot life', () => {
    // Shop practice: warn at 80 % and lock at 100 % (common practice, no published source).
    const result = mixTimes({ mixedAt, inductionMin: 0, potLifeMin: 100, refTempC: 20, tempC: 20 });
    expect(minutesAfterMix(result.potLifeWarningAt)).toBeCloseTo(80, 9);
  });

  it('refuses a pot life no longer than the induction time', () => {
    expect(() => mixTimes({ mixedAt, inductionMin: 60, potLifeMin: 60, refTempC: 20, tempC: 20 })).toThrow(
      expect.objectContaining({ field: 'inductionMin' }),
    );
    expect(() => mixTimes({ mixedAt, inductionMin: 0, potLifeMin: -5, refTempC: 20, tempC: 20 })).toThrow(
      expect.objectContaining({ field: 'potLifeMin' }),
    );
  });
});
