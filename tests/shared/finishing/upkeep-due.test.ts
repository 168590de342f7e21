import { TZDate } from '@date-fns/tz';
import { addMonths, differenceInCalendarDays, format } from 'date-fns';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FinishingInputError } from '../../../shared/errors';
import { addCalendarMonths, daysBetween, dueStatus, filterBankStatus, meanFaceVelocityMps, nextDueDate, worseStatus } from '../../../shared/finishing/upkeep-due';
import { calendarDateIn } from '../../../shared/time';

/** date-fns as the reference library: local midnight of a YYYY-MM-DD, in UTC so the test machine's zone cannot move it. */
const utcDay = (date: string) => new TZDate(`${date}T00:00:00`, 'UTC');
const dateFnsAddMonths = (date: string, months: number) => format(addMonths(utcDay(date), months), 'yyyy-MM-dd');

describe('addCalendarMonths', () => {
  it('keeps the day of the month when the target month has it', () => {
    // Reference: date-fns addMonths.
    expect(addCalendarMonths('2025-03-14', 12)).toBe('2026-03-14');
    expect(addCalendarMonths('2025-03-14', 12)).toBe(dateFnsAddMonths('2025-03-14', 12));
  });

  it('ends on the last day of a shorter month: 31 January + 1 month is 28 February, or 29 in a leap year', () => {
    // Reference: date-fns addMonths clamps to the month's last day; so do calendars people use.
    expect(addCalendarMonths('2025-01-31', 1)).toBe('2025-02-28');
    expect(addCalendarMonths('2024-01-31', 1)).toBe('2024-02-29');
    expect(addCalendarMonths('2024-02-29', 12)).toBe('2025-02-28');
    expect(addCalendarMonths('2025-08-31', 1)).toBe('2025-09-30');
  });

  it('runs across a year end: the 14 months of an extraction test done on 30 November', () => {
    // 14 months is HSE HSG258's longest interval between thorough examinations of LEV.
    expect(addCalendarMonths('2025-11-30', 14)).toBe('2027-01-30');
    expect(addCalendarMonths('2025-12-31', 14)).toBe('2027-02-28');
  });

  it('agrees with date-fns addMonths for any date and interval', () => {
    const dates = fc.date({ min: new Date('2000-01-01T00:00:00Z'), max: new Date('2099-12-31T00:00:00Z'), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10));
    fc.assert(fc.property(dates, fc.integer({ min: 0, max: 60 }), (date, months) => addCalendarMonths(date, months) === dateFnsAddMonths(date, months)));
  });

  it('refuses dates that do not exist and silly intervals', () => {
    expect(() => addCalendarMonths('2025-02-30', 1)).toThrow(FinishingInputError);
    expect(() => addCalendarMonths('30/01/2025', 1)).toThrow(FinishingInputError);
    expect(() => addCalendarMonths('2025-01-30', -1)).toThrow(FinishingInputError);
    expect(() => addCalendarMonths('2025-01-30', 1.5)).toThrow(FinishingInputError);
  });
});

describe('daysBetween', () => {
  it('counts whole calendar days, the same across the clock changes', () => {
    // Reference: date-fns differenceInCalendarDays. UK summer time began 30 March 2025 and ended 26 October 2025:
    // those days are 23 and 25 hours long on the wall clock, but still one day each.
    expect(daysBetween('2025-03-29', '2025-03-31')).toBe(2);
    expect(daysBetween('2025-10-25', '2025-10-27')).toBe(2);
    expect(daysBetween('2025-10-25', '2025-10-27')).toBe(differenceInCalendarDays(utcDay('2025-10-27'), utcDay('2025-10-25')));
    expect(daysBetween('2025-03-01', '2025-02-01')).toBe(-28);
  });
});

describe('dueStatus', () => {
  it('is valid through the due date, due soon within the warning days, lapsed from the day after', () => {
    // The shop's rule: due soon 30 days ahead (common practice, no published source).
    expect(dueStatus('2025-06-30', '2025-05-30', 30)).toBe('valid');
    expect(dueStatus('2025-06-30', '2025-05-31', 30)).toBe('due-soon');
    expect(dueStatus('2025-06-30', '2025-06-30', 30)).toBe('due-soon');
    expect(dueStatus('2025-06-30', '2025-07-01', 30)).toBe('lapsed');
    expect(dueStatus(null, '2025-07-01', 30)).toBe('none');
  });

  it('takes "today" as the shop’s calendar date, so a test due on the Sunday summer time ends lapses at local midnight, not UTC midnight', () => {
    // 26 October 2025, 23:30 in London (GMT again) is 23:30 UTC; 00:30 on 27 October is 00:30 UTC.
    // On 30 March 2025, 00:30 UTC is 00:30 GMT; 23:30 UTC is 00:30 BST on 31 March. Reference for the zone: @date-fns/tz.
    const london = (iso: string) => calendarDateIn(new Date(iso), 'Europe/London');
    expect(london('2025-10-26T23:30:00Z')).toBe(format(new TZDate(new Date('2025-10-26T23:30:00Z'), 'Europe/London'), 'yyyy-MM-dd'));
    expect(dueStatus('2025-10-26', london('2025-10-26T23:30:00Z'), 30)).toBe('due-soon');
    expect(dueStatus('2025-03-30', london('2025-03-30T22:59:00Z'), 30)).toBe('due-soon');
    expect(london('2025-03-30T23:30:00Z')).toBe('2025-03-31');
    expect(dueStatus('2025-03-30', london('2025-03-30T23:30:00Z'), 30)).toBe('lapsed');
  });
});

describe('nextDueDate', () => {
  it('takes the date the tester gave, else adds the shop’s interval, else has none', () => {
    expect(nextDueDate('2025-01-31', 12, '2025-12-01')).toBe('2025-12-01');
    expect(nextDueDate('2025-01-31', 12, null)).toBe('2026-01-31');
    expect(nextDueDate('2025-01-31', null, null)).toBeNull();
    expect(() => nextDueDate('2025-01-31', 12, '2025-01-30')).toThrow(/before the date/);
  });
});

describe('worseStatus', () => {
  it('orders lapsed, due soon, none, valid', () => {
    expect(worseStatus('valid', 'due-soon')).toBe('due-soon');
    expect(worseStatus('lapsed', 'due-soon')).toBe('lapsed');
    expect(worseStatus('none', 'valid')).toBe('none');
  });
});

describe('meanFaceVelocityMps', () => {
  it('is the arithmetic mean of the traverse readings', () => {
    // Worked by hand: (0.52 + 0.48 + 0.55 + 0.45) / 4 = 0.50 m/s.
    expect(meanFaceVelocityMps([0.52, 0.48, 0.55, 0.45])).toBeCloseTo(0.5, 10);
    expect(() => meanFaceVelocityMps([])).toThrow(FinishingInputError);
    expect(() => meanFaceVelocityMps([0.5, -0.1])).toThrow(FinishingInputError);
  });
});

describe('filterBankStatus', () => {
  const bank = { changeAtPa: 250 };
  it('reads the latest gauge reading after the last change against the change-at pressure drop', () => {
    // Near the limit from 80 % of it (common practice, no published source): 200 Pa of 250.
    const latest = (pa: number) => ({ ...bank, latestReading: { pressureDropPa: pa, at: '2025-05-02T08:00:00.000Z' }, lastChange: { changedAt: '2025-04-01T08:00:00.000Z', afterPa: 60 } });
    expect(filterBankStatus(latest(199))).toEqual({ status: 'ok', currentPa: 199 });
    expect(filterBankStatus(latest(200))).toEqual({ status: 'near-limit', currentPa: 200 });
    expect(filterBankStatus(latest(250))).toEqual({ status: 'over-limit', currentPa: 250 });
  });

  it('ignores a reading from before the filters were changed and uses the reading noted at the change', () => {
    const state = { ...bank, latestReading: { pressureDropPa: 290, at: '2025-04-01T07:00:00.000Z' }, lastChange: { changedAt: '2025-04-01T08:00:00.000Z', afterPa: 60 } };
    expect(filterBankStatus(state)).toEqual({ status: 'ok', currentPa: 60 });
    expect(filterBankStatus({ ...state, lastChange: { ...state.lastChange, afterPa: null } })).toEqual({ status: 'no-reading', currentPa: null });
    expect(filterBankStatus({ ...bank, latestReading: null, lastChange: null })).toEqual({ status: 'no-reading', currentPa: null });
  });
});
