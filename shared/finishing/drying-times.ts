import { FinishingInputError } from '../errors';
import type { UnitSystem } from '../schemas/common';
import { formatQuantity } from '../units';
import { dryingTableSchema, type DryingRow } from './drying-row-schema';
import { requireFinite, requireNonNegative } from './validate';
import type { FinishingWarning } from './warnings';

export { dryingRowSchema, dryingTableSchema, type DryingRow } from './drying-row-schema';

export type DryingTimes = Omit<DryingRow, 'tempC'>;
export type DryingMethod = 'single-row-rule' | 'interpolated' | 'extrapolated' | 'exact-row';
export type AdjustedDryingTimes = { times: DryingTimes; method: DryingMethod; warnings: FinishingWarning[] };
export type AdjustDryingOptions = { minApplicationTempC?: number | null; units?: UnitSystem };

const scaledKeys = ['flashOffMin', 'recoatMinMin', 'touchDryMin', 'handleMin', 'packMin', 'fullCureH'] as const;

/**
 * Rule of thumb (common trade practice, no primary source) for a data sheet that gives times
 * at one temperature only: a time doubles for every 10 °C colder and halves for every 10 °C
 * warmer, t(T) = t_ref · 2^((T_ref − T)/10).
 * It is an estimate; it does not hold below a product's minimum film-forming temperature.
 */
export function scaleByTenDegreeRule(timeMin: number, refTempC: number, tempC: number): number {
  requireNonNegative('timeMin', timeMin, 'the time');
  requireFinite('refTempC', refTempC, 'the reference temperature');
  requireFinite('tempC', tempC, 'the temperature');
  return timeMin * 2 ** ((refTempC - tempC) / 10);
}

/** Drying times at `tempC`, from a product's drying table (one or more temperature rows). */
export function adjustDryingTimes(
  rows: DryingRow[],
  tempC: number,
  opts: AdjustDryingOptions = {},
): AdjustedDryingTimes {
  requireFinite('tempC', tempC, 'the drying temperature');
  const table = parseTable(rows);
  const { times, method } = table.length === 1 ? fromOneRow(table[0], tempC) : fromSeveralRows(table, tempC);
  return { times, method, warnings: dryingWarnings(table, tempC, method, opts) };
}

// A board works out hundreds of parts from the same few products' tables: each table is checked
// and sorted once. Keyed by the array itself, so a changed product (a new array) is checked again.
const parsedTables = new WeakMap<DryingRow[], DryingRow[]>();

function parseTable(rows: DryingRow[]): DryingRow[] {
  const known = parsedTables.get(rows);
  if (known) return known;
  const table = checkedTable(rows);
  parsedTables.set(rows, table);
  return table;
}

function checkedTable(rows: DryingRow[]): DryingRow[] {
  const parsed = dryingTableSchema.safeParse(rows);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = ['dryingTimes', ...issue.path.map(String)].join('.');
    throw new FinishingInputError(field, issue.message);
  }
  return [...parsed.data].sort((a, b) => a.tempC - b.tempC);
}

function withoutTemp({ tempC: _tempC, ...times }: DryingRow): DryingTimes {
  return times;
}

function fromOneRow(row: DryingRow, tempC: number): { times: DryingTimes; method: DryingMethod } {
  if (row.tempC === tempC) return { times: withoutTemp(row), method: 'exact-row' };
  const scale = (value: number) => scaleByTenDegreeRule(value, row.tempC, tempC);
  const times = { ...withoutTemp(row) };
  for (const key of scaledKeys) times[key] = scale(row[key]);
  times.recoatMaxMin = row.recoatMaxMin === null ? null : scale(row.recoatMaxMin);
  return { times, method: 'single-row-rule' };
}

function fromSeveralRows(table: DryingRow[], tempC: number): { times: DryingTimes; method: DryingMethod } {
  const exact = table.find((row) => row.tempC === tempC);
  if (exact) return { times: withoutTemp(exact), method: 'exact-row' };
  // Beyond either end, the nearest pair of rows sets the slope.
  const start = Math.min(table.length - 2, Math.max(0, lastRowBelow(table, tempC)));
  const [low, high] = [table[start], table[start + 1]];
  const fraction = (tempC - low.tempC) / (high.tempC - low.tempC);
  const times = { ...withoutTemp(low) };
  for (const key of scaledKeys) times[key] = logBlend(low[key], high[key], fraction);
  times.recoatMaxMin =
    low.recoatMaxMin === null || high.recoatMaxMin === null ? null : logBlend(low.recoatMaxMin, high.recoatMaxMin, fraction);
  // Extrapolating can cross the two recoat lines; a window that shuts before it opens means "abrade first".
  if (times.recoatMaxMin !== null) times.recoatMaxMin = Math.max(times.recoatMaxMin, times.recoatMinMin);
  const outside = tempC < table[0].tempC || tempC > table[table.length - 1].tempC;
  return { times, method: outside ? 'extrapolated' : 'interpolated' };
}

function lastRowBelow(table: DryingRow[], tempC: number): number {
  let index = -1;
  table.forEach((row, i) => {
    if (row.tempC < tempC) index = i;
  });
  return index;
}

/**
 * ln(time) linear in temperature: the straight-line form of an Arrhenius-type rate between
 * two measured points. ln(0) has no value, so a zero time ("recoat at once") blends
 * linearly instead and never drops below zero.
 */
function logBlend(lowTime: number, highTime: number, fraction: number): number {
  if (lowTime > 0 && highTime > 0) return lowTime * (highTime / lowTime) ** fraction;
  return Math.max(0, lowTime + (highTime - lowTime) * fraction);
}

function dryingWarnings(
  table: DryingRow[],
  tempC: number,
  method: DryingMethod,
  { minApplicationTempC, units = 'metric' }: AdjustDryingOptions,
): FinishingWarning[] {
  const warnings: FinishingWarning[] = [];
  const temp = (value: number) => formatQuantity(value, 'temperature', units);
  if (minApplicationTempC != null && tempC < minApplicationTempC) {
    warnings.push({
      code: 'below-min-application-temp',
      message: `${temp(tempC)} is below this product's minimum of ${temp(minApplicationTempC)}. It may not dry or cure properly, so these times cannot be relied on.`,
    });
  }
  if (method === 'extrapolated') {
    warnings.push({
      code: 'outside-data-sheet-temps',
      message: `${temp(tempC)} is outside the data sheet's range (${temp(table[0].tempC)} to ${temp(table[table.length - 1].tempC)}). These times are projected beyond it; check the surface before moving on.`,
    });
  }
  return warnings;
}
