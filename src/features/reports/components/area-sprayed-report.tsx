import type { UnitSystem } from '../../../../shared/schemas/common';
import type { AreaSprayedReport as Report } from '../../../../shared/schemas/report';
import { useAreaSprayedReport } from '../../../api/reports/get-area-sprayed-report';
import type { ReportParams } from '../../../api/reports/report-keys';
import { areaWords, capitalised, percentWords, shown, symbolOf } from '../utils/report-format';
import { weekShortWords, weekWords } from '../utils/report-range';
import { stackRows, weeksIn } from '../utils/report-series';
import { ChartFrame } from './chart-frame';
import { ReportEmpty } from './report-empty';
import { StackedBarsChart } from './lazy-charts';
import { ReportLayout } from './report-layout';
import { ReportStatus } from './report-status';
import { ReportTable, type ReportColumn } from './report-table';

type Row = Report['rows'][number];
interface ViewProps {
  report: Report;
  units: UnitSystem;
  generatedAt: number;
  timeZone: string;
}

const groupWords = { 'product-kind': { one: 'Product kind', other: 'Other kinds' }, job: { one: 'Job', other: 'Other jobs' } } as const;

/** The key with the most area and its share, e.g. "Topcoat (46 %)". */
function largestShare(rows: Row[], total: number): string {
  const byKey = new Map<string, { label: string; area: number }>();
  for (const row of rows) byKey.set(row.key, { label: row.label, area: (byKey.get(row.key)?.area ?? 0) + row.areaM2 });
  const [top] = [...byKey.values()].sort((a, b) => b.area - a.area);
  return top ? `${top.label} (${percentWords(top.area, total)})` : '–';
}

function AreaSprayedView({ report, units, generatedAt, timeZone }: ViewProps) {
  const words = groupWords[report.groupBy];
  if (report.rows.length === 0) return <ReportEmpty title="No coats sprayed in this range">The area of every coat recorded appears here week by week, by product kind or by job.</ReportEmpty>;
  // Product kinds come as their codes ("topcoat"); a heading-style first capital reads better in the legend and table.
  const rows = report.rows.map((row) => ({ ...row, label: capitalised(row.label) })).sort((a, b) => a.weekStart.localeCompare(b.weekStart) || b.areaM2 - a.areaM2);
  const area = rows.reduce((total, row) => total + row.areaM2, 0);
  const coats = rows.reduce((total, row) => total + row.coats, 0);
  const unit = symbolOf('area', units);
  const { data, series } = stackRows(rows, weeksIn(report), { x: (r) => r.weekStart, series: (r) => r.key, label: (r) => r.label, value: (r) => shown(r.areaM2, 'area', units) }, words.other);
  const columns: ReportColumn<Row>[] = [
    { header: 'Week', cell: (row) => weekWords(row.weekStart) },
    { header: words.one, cell: (row) => row.label },
    { header: 'Coats', cell: (row) => row.coats, numeric: true },
    { header: 'Area', cell: (row) => areaWords(row.areaM2, units), numeric: true },
  ];
  return (
    <ReportLayout
      generatedAt={generatedAt}
      timeZone={timeZone}
      figures={[
        { label: 'Area sprayed', value: areaWords(area, units) },
        { label: 'Coats', value: coats },
        { label: 'Average per week', value: areaWords(area / weeksIn(report).length, units) },
        { label: `Most area (${words.one.toLowerCase()})`, value: largestShare(rows, area) },
      ]}
      chart={
        <ChartFrame label={`Stacked bar chart of area sprayed per week by ${words.one.toLowerCase()}. The table gives the same figures.`}>
          <StackedBarsChart data={data} series={series} unit={unit} digits={units === 'us' ? 0 : 1} xWords={weekShortWords} xLongWords={weekWords} />
        </ChartFrame>
      }
      table={
        <ReportTable
          caption={`Area sprayed per week by ${words.one.toLowerCase()}`}
          columns={columns}
          rows={rows}
          rowKey={(row) => `${row.weekStart}-${row.key}`}
          footer={['Total', '', coats, areaWords(area, units)]}
        />
      }
    />
  );
}

export function AreaSprayedReport({ params, units, timeZone }: { params: ReportParams['area-sprayed']; units: UnitSystem; timeZone: string }) {
  const query = useAreaSprayedReport(params);
  return (
    <ReportStatus query={query} what="the area sprayed report">
      {(report) => <AreaSprayedView report={report} units={units} generatedAt={query.dataUpdatedAt} timeZone={timeZone} />}
    </ReportStatus>
  );
}
