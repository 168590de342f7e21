import type { SolventReport } from '../../../../shared/schemas/report';
import { monthsIn } from './report-series';

type Month = SolventReport['rows'][number];

/** A quiet month's year-so-far: the month before's, or the next month's less what that month added. */
function runningAt(month: string, rows: Month[]): number {
  const sameYear = rows.filter((row) => row.month.startsWith(month.slice(0, 4)));
  const before = sameYear.filter((row) => row.month.slice(0, 7) < month).at(-1);
  if (before) return before.runningTotalKg;
  const after = sameYear.find((row) => row.month.slice(0, 7) > month);
  return after ? after.runningTotalKg - after.vocKg : 0;
}

/** Every month of the range, months with nothing mixed included, so the axis and table have no gaps. */
export function everyMonth(report: SolventReport): Month[] {
  const rows = [...report.rows].sort((a, b) => a.month.localeCompare(b.month));
  const byMonth = new Map(rows.map((row) => [row.month.slice(0, 7), row]));
  return monthsIn(report).map((month) => byMonth.get(month) ?? { month, litres: 0, vocKg: 0, runningTotalKg: runningAt(month, rows), litresWithoutVoc: 0 });
}
