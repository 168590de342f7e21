import type { DateRange } from './report-range';
import { shiftMonth } from './report-range';

export type ChartRow = Record<string, string | number>;
/** `key` is a safe field name in the chart rows (never the raw label, which may hold dots). */
export interface ChartSeries {
  key: string;
  label: string;
}

interface StackPick<T> {
  x: (row: T) => string;
  series: (row: T) => string;
  label: (row: T) => string;
  value: (row: T) => number;
}

/** Every month the range touches ("2026-01" …), so months with nothing still get their place on the axis. */
export function monthsIn(range: DateRange): string[] {
  const months: string[] = [];
  for (let month = range.from.slice(0, 7); month <= range.to.slice(0, 7); month = shiftMonth(month, 1)) months.push(month);
  return months;
}

/** The Monday of every week the range touches (the server's weeks start on the shop's Monday). */
export function weeksIn(range: DateRange): string[] {
  const start = new Date(`${range.from}T00:00:00Z`);
  start.setUTCDate(start.getUTCDate() - ((start.getUTCDay() + 6) % 7));
  const weeks: string[] = [];
  for (const day = start; day.toISOString().slice(0, 10) <= range.to; day.setUTCDate(day.getUTCDate() + 7)) weeks.push(day.toISOString().slice(0, 10));
  return weeks;
}

/**
 * Long rows (x, series, value) as one chart row per x with a field per series, for stacked bars.
 * Beyond `max` series the smallest fold into one "other" series so the colours stay tellable apart;
 * the table beside the chart still lists every one.
 */
export function stackRows<T>(rows: T[], xs: string[], pick: StackPick<T>, otherLabel: string, max = 8): { data: ChartRow[]; series: ChartSeries[] } {
  const totals = new Map<string, { label: string; total: number }>();
  for (const row of rows) {
    const id = pick.series(row);
    const entry = totals.get(id) ?? { label: pick.label(row), total: 0 };
    entry.total += pick.value(row);
    totals.set(id, entry);
  }
  const ranked = [...totals].sort((a, b) => b[1].total - a[1].total);
  const kept = ranked.length > max ? ranked.slice(0, max - 1) : ranked;
  const keyOf = new Map(kept.map(([id], index) => [id, `s${index}`]));
  const series: ChartSeries[] = kept.map(([id, { label }]) => ({ key: keyOf.get(id)!, label }));
  if (kept.length < ranked.length) series.push({ key: 'other', label: otherLabel });

  const byX = new Map<string, ChartRow>(xs.map((x) => [x, Object.fromEntries([['x', x], ...series.map((s) => [s.key, 0])])]));
  for (const row of rows) {
    const x = pick.x(row);
    const chartRow = byX.get(x) ?? Object.fromEntries([['x', x], ...series.map((s) => [s.key, 0])]);
    const key = keyOf.get(pick.series(row)) ?? 'other';
    chartRow[key] = Number(chartRow[key]) + pick.value(row);
    byX.set(x, chartRow);
  }
  return { data: [...byX.values()].sort((a, b) => String(a.x).localeCompare(String(b.x))), series };
}
