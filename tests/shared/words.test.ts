import { describe, expect, it } from 'vitest';
import { calendarDateWords, coatAtStepWords, coatOfWords, denibNeededWords, denibWords, mixWords, moneyWords, partsWords, shopMomentWords, shopSpanWords, shopTimeWords, spraySessionWords } from '../../shared/words';

const london = { timeZone: 'Europe/London', locale: 'en-GB' };

describe('the shared vocabulary', () => {
  it('names coats, denibs and parts one way', () => {
    expect(coatOfWords(2, 3)).toBe('coat 2 of 3');
    expect(denibWords('P320')).toBe('denib with P320');
    expect(denibNeededWords('P400')).toBe('Denib with P400 needed');
    expect([partsWords(1), partsWords(3)]).toEqual(['1 part', '3 parts']);
  });

  it('counts a finish system’s coat steps only, so the coat after a denib is coat 2, not step 3', () => {
    const steps = [{ position: 0, kind: 'coat' }, { position: 1, kind: 'abrade' }, { position: 2, kind: 'coat' }, { position: 3, kind: 'coat' }];
    expect(coatAtStepWords(steps, 0)).toBe('coat 1 of 3');
    expect(coatAtStepWords(steps, 2)).toBe('coat 2 of 3');
    expect(coatAtStepWords(steps, 1)).toBeNull();
  });

  it('writes shop times in the shop’s zone and locale with no zone name, DST included', () => {
    // 30 March 2025: the UK moves from GMT to BST at 01:00 UTC (UK government, "When do the clocks change?").
    expect(shopTimeWords(new Date('2025-03-30T00:30:00Z'), london)).toBe('00:30');
    expect(shopTimeWords(new Date('2025-03-30T01:30:00Z'), london)).toBe('02:30');
    expect(shopMomentWords(new Date('2025-03-31T08:00:00Z'), london)).toBe('Mon 31 Mar, 09:00');
    expect(shopMomentWords(new Date('2025-03-31T08:00:00Z'), { timeZone: 'America/New_York', locale: 'en-US' })).toBe('Mon, Mar 31, 04:00 AM');
    expect(shopSpanWords(new Date('2025-03-31T08:00:00Z'), new Date('2025-03-31T11:00:00Z'), london)).toBe('Mon 31 Mar, 09:00–12:00');
    expect(shopSpanWords(new Date('2025-03-31T22:00:00Z'), new Date('2025-04-01T00:30:00Z'), london)).toBe('Mon 31 Mar, 23:00–Tue 1 Apr, 01:30');
    expect(calendarDateWords('2027-03-03', 'en-GB')).toBe('Wed, 3 Mar 2027');
  });

  it('names a spray session by booth and start, and a mix by product and time, never by id', () => {
    expect(spraySessionWords({ boothName: 'Booth 1', startAt: new Date('2027-03-01T09:00:00Z') }, london)).toBe('Booth 1, Mon 1 Mar, 09:00');
    expect(mixWords({ productName: 'Kestrel Precat Clear Matt', mixedAt: new Date('2027-03-01T09:15:00Z') }, london)).toBe('Kestrel Precat Clear Matt mixed at 09:15');
  });

  it('writes money in the shop’s currency and locale', () => {
    expect(moneyWords(12.4, 'GBP', 'en-GB')).toBe('£12.40');
    // German writes the euro after the amount with a decimal comma and a no-break space (CLDR).
    expect(moneyWords(12.4, 'EUR', 'de-DE')).toBe('12,40\u00a0€');
  });
});
