import { describe, expect, it } from 'vitest';
import type { ConditionsReport, SolventReport } from '../../../../shared/schemas/report';
import { outsideReasonWords, strictestLimits } from '../../../../src/features/reports/utils/conditions-words';
import { reworkReasonWords, vocWords } from '../../../../src/features/reports/utils/report-format';
import { monthRange, openingRange, quickRange, rangeWords, shiftMonth, wholeMonthOf } from '../../../../src/features/reports/utils/report-range';
import { monthsIn, stackRows, weeksIn } from '../../../../src/features/reports/utils/report-series';
import { everyMonth } from '../../../../src/features/reports/utils/solvent-months';
import { reportRequest } from '../../../../src/features/reports/utils/report-request';

describe('report ranges', () => {
  it('gives whole calendar periods for the quick picks, across a year end', () => {
    expect(quickRange('this-month', '2026-01-15')).toEqual({ from: '2026-01-01', to: '2026-01-31' });
    expect(quickRange('last-month', '2026-01-15')).toEqual({ from: '2025-12-01', to: '2025-12-31' });
    expect(quickRange('this-year', '2026-01-15')).toEqual({ from: '2026-01-01', to: '2026-12-31' });
    expect(quickRange('last-12-months', '2026-01-15')).toEqual({ from: '2025-02-01', to: '2026-01-31' });
  });
  it('opens on the last four weeks: 28 days up to today, across a month, a year end and a leap day', () => {
    expect(openingRange('2026-12-05')).toEqual({ from: '2026-11-08', to: '2026-12-05' });
    expect(quickRange('last-4-weeks', '2026-01-03')).toEqual({ from: '2025-12-07', to: '2026-01-03' });
    expect(quickRange('last-4-weeks', '2028-03-10')).toEqual({ from: '2028-02-12', to: '2028-03-10' });
  });
  it('knows the length of February in leap and common years', () => {
    expect(monthRange('2028-02')).toEqual({ from: '2028-02-01', to: '2028-02-29' });
    expect(monthRange('2026-02').to).toBe('2026-02-28');
    expect(shiftMonth('2026-03', -15)).toBe('2024-12');
  });
  it('names a range the way people say it', () => {
    expect(rangeWords({ from: '2026-03-01', to: '2026-03-31' })).toBe('March 2026');
    expect(rangeWords({ from: '2026-01-01', to: '2026-12-31' })).toBe('2026');
    expect(rangeWords({ from: '2026-03-02', to: '2026-04-14' })).toBe('2 Mar 2026 – 14 Apr 2026');
    expect(wholeMonthOf({ from: '2026-03-01', to: '2026-03-30' })).toBeNull();
  });
});

describe('chart series', () => {
  it('lists every month and every Monday the range touches', () => {
    expect(monthsIn({ from: '2025-11-20', to: '2026-02-03' })).toEqual(['2025-11', '2025-12', '2026-01', '2026-02']);
    // 1 Oct 2026 is a Thursday: its week starts on Monday 28 September.
    expect(weeksIn({ from: '2026-10-01', to: '2026-10-19' })).toEqual(['2026-09-28', '2026-10-05', '2026-10-12', '2026-10-19']);
  });
  it('stacks long rows per period and folds the smallest series into one "other"', () => {
    const rows = [
      { x: '2026-01', k: 'a', v: 5 },
      { x: '2026-01', k: 'b', v: 3 },
      { x: '2026-02', k: 'c', v: 1 },
      { x: '2026-02', k: 'd', v: 0.5 },
    ];
    const { data, series } = stackRows(rows, ['2026-01', '2026-02', '2026-03'], { x: (r) => r.x, series: (r) => r.k, label: (r) => r.k.toUpperCase(), value: (r) => r.v }, 'Others', 3);
    expect(series).toEqual([
      { key: 's0', label: 'A' },
      { key: 's1', label: 'B' },
      { key: 'other', label: 'Others' },
    ]);
    expect(data).toEqual([
      { x: '2026-01', s0: 5, s1: 3, other: 0 },
      { x: '2026-02', s0: 0, s1: 0, other: 1.5 },
      { x: '2026-03', s0: 0, s1: 0, other: 0 },
    ]);
  });
});

describe('solvent months', () => {
  const report = (rows: SolventReport['rows']): SolventReport => ({ from: '2025-11-01', to: '2026-03-31', timezone: 'UTC', siteId: null, thresholdKg: 100, totalKg: 0, rows });
  const row = (month: string, vocKg: number, runningTotalKg: number) => ({ month, litres: vocKg * 2, vocKg, runningTotalKg, litresWithoutVoc: 0 });
  it('fills quiet months, carrying the year so far and starting again in January', () => {
    const months = everyMonth(report([row('2025-11', 4, 40), row('2026-02', 3, 3)]));
    expect(months.map((m) => [m.month, m.runningTotalKg])).toEqual([
      ['2025-11', 40],
      ['2025-12', 40],
      ['2026-01', 0],
      ['2026-02', 3],
      ['2026-03', 3],
    ]);
  });
  it('works a quiet first month back from the next month of the same year', () => {
    const months = everyMonth({ ...report([row('2026-03', 2, 12)]), from: '2026-02-01' });
    expect(months[0]).toMatchObject({ month: '2026-02', runningTotalKg: 10 });
  });
});

describe('words for the reports', () => {
  it('names re-spray reasons by their label and keeps a correction’s own words', () => {
    expect(reworkReasonWords('repeated', 'dust-or-debris')).toBe('Dust or debris');
    expect(reworkReasonWords('corrected', 'wet film typed wrong')).toBe('Wet film typed wrong');
    expect(reworkReasonWords('corrected', '')).toBe('No reason given');
  });
  it('gives VOC in kilograms, or pounds for US users', () => {
    expect(vocWords(12.34, 'metric')).toBe('12.3 kg');
    // Rounded once: 15.749 kg is 15.7, not 15.75 rounded again to 15.8.
    expect(vocWords(15.749, 'metric')).toBe('15.7 kg');
    // 1 kg = 2.20462 lb (avoirdupois pound of 453.59237 g).
    expect(vocWords(1, 'us')).toBe('2.2 lb');
  });

  const limit = (productId: number, min: number | null, max: number | null) => ({ productId, productName: `P${productId}`, minApplicationTempC: min, maxRelativeHumidityPct: max });
  it('draws the strictest limits: the highest minimum and the lowest maximum', () => {
    const strictest = strictestLimits([limit(1, 12, 80), limit(2, 15, null), limit(3, null, 75)]);
    expect(strictest.minTempC?.productId).toBe(2);
    expect(strictest.maxRh?.productId).toBe(3);
  });
  it('says why a coat is outside, with its figure and the limit it broke', () => {
    const coat: ConditionsReport['coatsOutside'][number] = {
      coatId: 12,
      sprayedAt: '2026-10-26T08:50:00Z',
      productId: 2,
      productName: 'P2',
      airTempC: 12.5,
      surfaceTempC: 11.7,
      relativeHumidityPct: 82,
      dewPointMarginC: 2.2,
      reasons: ['air-too-cold', 'rh-too-high', 'dew-point-margin'],
    };
    expect(outsideReasonWords(coat, limit(2, 15, 75), 3, 'metric')).toEqual([
      'Air too cold: 12.5 °C (minimum 15.0 °C)',
      'Humidity too high: 82 % (maximum 75 %)',
      'Too close to the dew point: surface 2.2 °C above the dew point (needs at least 3.0 °C above)',
    ]);
    // A margin is a temperature difference: 3 °C is 5.4 °F, with no 32° offset.
    expect(outsideReasonWords({ ...coat, reasons: ['dew-point-margin'] }, undefined, 3, 'us')[0]).toBe('Too close to the dew point: surface 4.0 °F above the dew point (needs at least 5.4 °F above)');
    // A surface colder than the dew point is said to be below it.
    expect(outsideReasonWords({ ...coat, dewPointMarginC: -1.5, reasons: ['dew-point-margin'] }, undefined, 3, 'metric')[0]).toBe('Below the dew point: surface 1.5 °C below the dew point (needs at least 3.0 °C above)');
  });
});

describe('report requests', () => {
  const address = { kind: 'solvent' as const, range: { from: '2026-10-01', to: '2026-10-31' }, boothId: undefined, groupBy: 'product-kind' as const, jobId: undefined };

  it('asks for one site only when an admin picked one', () => {
    expect(reportRequest(address, undefined)).toEqual({ kind: 'solvent', params: { from: '2026-10-01', to: '2026-10-31' } });
    expect(reportRequest(address, undefined, 4)).toEqual({ kind: 'solvent', params: { from: '2026-10-01', to: '2026-10-31', siteId: 4 } });
  });

  it('asks nothing for a backwards range, and conditions only with a booth', () => {
    expect(reportRequest({ ...address, range: { from: '2026-10-31', to: '2026-10-01' } }, undefined)).toBeNull();
    expect(reportRequest({ ...address, kind: 'conditions' }, undefined)).toBeNull();
    expect(reportRequest({ ...address, kind: 'conditions' }, 2, 4)).toEqual({ kind: 'conditions', params: { from: '2026-10-01', to: '2026-10-31', siteId: 4, boothId: 2 } });
  });
});
