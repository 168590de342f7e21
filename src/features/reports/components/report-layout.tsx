import type { ReactNode } from 'react';
import { formatShopDateTime } from '../../../lib/shop-time';

interface KeyFigure {
  label: string;
  value: ReactNode;
  /** Marks a figure that needs attention (over a threshold, coats outside limits); always with words. */
  alert?: boolean;
}

interface ReportLayoutProps {
  figures: KeyFigure[];
  chart: ReactNode;
  table: ReactNode;
  /** Further detail under chart and table (the coats made outside limits). */
  detail?: ReactNode;
  /** Narrow tables sit beside the chart on very wide screens; below that (and on paper) the table goes under it. */
  tableBeside?: boolean;
  generatedAt: number;
  timeZone: string;
}

export function ReportLayout({ figures, chart, table, detail, tableBeside = true, generatedAt, timeZone }: ReportLayoutProps) {
  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-2 gap-3 md:grid-cols-4 print:grid-cols-4">
        {figures.map((figure) => (
          <div key={figure.label} className={`rounded-panel border bg-white p-3 ${figure.alert ? 'border-2 border-verdict-stop' : 'border-maple-300'}`}>
            <dt className="text-sm text-maple-700">{figure.label}</dt>
            <dd className={`text-xl font-bold tabular-nums ${figure.alert ? 'text-verdict-stop' : 'text-lacquer-900'}`}>{figure.value}</dd>
          </div>
        ))}
      </dl>
      <div className={tableBeside ? 'grid items-start gap-4 2xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] print:block print:space-y-4' : 'space-y-4'}>
        {chart}
        {table}
      </div>
      {detail}
      <p className="text-sm text-maple-700">Figures as of {formatShopDateTime(new Date(generatedAt).toISOString(), timeZone)} (shop time).<span className="print:hidden"> The CSV gives the same table in metric units.</span></p>
    </div>
  );
}
