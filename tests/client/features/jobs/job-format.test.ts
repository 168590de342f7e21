import { describe, expect, it } from 'vitest';
import { dueWords, formatDueDate } from '../../../../src/features/jobs/components/job-format';
import { litres, missingDataWords, vocMass } from '../../../../src/features/jobs/components/estimate-format';

describe('dueWords', () => {
  const today = '2026-03-10';
  it('counts days to the due date in the shop’s calendar', () => {
    expect(dueWords({ dueDate: '2026-03-10', state: 'open' }, today).relation).toBe('Due today');
    expect(dueWords({ dueDate: '2026-03-11', state: 'open' }, today).relation).toBe('Due tomorrow');
    expect(dueWords({ dueDate: '2026-03-20', state: 'in-finish' }, today).relation).toBe('Due in 10 days');
  });
  it('says overdue in words, across a month end', () => {
    expect(dueWords({ dueDate: '2026-02-27', state: 'open' }, today)).toMatchObject({ relation: 'Overdue by 11 days', overdue: true });
    expect(dueWords({ dueDate: '2026-03-09', state: 'open' }, today).relation).toBe('Overdue by 1 day');
  });
  it('never calls a delivered or cancelled job late', () => {
    for (const state of ['delivered', 'cancelled'] as const) expect(dueWords({ dueDate: '2026-01-01', state }, today)).toMatchObject({ relation: '', overdue: false });
  });
  it('calls a ready job late while it is not delivered', () => {
    expect(dueWords({ dueDate: '2026-03-09', state: 'ready' }, today)).toMatchObject({ relation: 'Overdue by 1 day', overdue: true });
  });
  it('keeps the calendar day whatever the device’s zone', () => expect(formatDueDate('2026-03-29')).toBe('Sun, 29 Mar 2026'));
});

describe('estimate words', () => {
  it('shows litres in US gallons for US users', () => {
    expect(litres(3.785411784, 'us')).toBe('1.00 US gal');
    expect(litres(2.5, 'metric')).toBe('2.50 L');
  });
  it('gives VOC in grams and kilograms, or pounds', () => {
    expect(vocMass(4346, 'metric')).toEqual({ main: '4,346 g', kilograms: '4.35 kg' });
    expect(vocMass(453.59237, 'us')).toEqual({ main: '1.00 lb', kilograms: null });
  });
  it('names what the totals leave out', () => {
    expect(missingDataWords(0, 0)).toEqual([]);
    expect(missingDataWords(1, 2)).toEqual([
      '1 coat step has no VOC figure on the data sheet, so the VOC total leaves them out.',
      '2 coat steps have no price on the data sheet, so the cost total leaves them out.',
    ]);
  });
});
