import type { ReworkReport as Report } from '../../../../shared/schemas/report';
import { useReworkReport } from '../../../api/reports/get-rework-report';
import type { ReportParams } from '../../../api/reports/report-keys';
import { percentWords, reworkKindWords, reworkReasonWords } from '../utils/report-format';
import { monthWords } from '../utils/report-range';
import { monthsIn, stackRows } from '../utils/report-series';
import { ChartFrame } from './chart-frame';
import { ReportEmpty } from './report-empty';
import { StackedBarsChart } from './lazy-charts';
import { ReportLayout } from './report-layout';
import { ReportStatus } from './report-status';
import { ReportTable, type ReportColumn } from './report-table';

type Row = Report['rows'][number];

const reasonLabel = (row: Row) => `${reworkKindWords[row.kind]}: ${reworkReasonWords(row.kind, row.reason)}`;

const columns: ReportColumn<Row>[] = [
  { header: 'Month', cell: (row) => monthWords(row.month) },
  { header: 'What', cell: (row) => reworkKindWords[row.kind] },
  { header: 'Reason', cell: (row) => reworkReasonWords(row.kind, row.reason) },
  { header: 'Coats', cell: (row) => row.count, numeric: true },
];

function ReworkView({ report, generatedAt, timeZone }: { report: Report; generatedAt: number; timeZone: string }) {
  const total = report.rows.reduce((sum, row) => sum + row.count, 0);
  if (total === 0) {
    return (
      <ReportEmpty title="No coats corrected or re-sprayed in this range">
        {report.coatCount === 1 ? '1 coat was' : `${report.coatCount} coats were`} recorded. Re-sprays (with the reason the sprayer picked) and corrected coat records appear here by month.
      </ReportEmpty>
    );
  }
  const rows = [...report.rows].sort((a, b) => a.month.localeCompare(b.month) || b.count - a.count);
  const count = (kind: Row['kind']) => rows.filter((row) => row.kind === kind).reduce((sum, row) => sum + row.count, 0);
  const { data, series } = stackRows(rows, monthsIn(report), { x: (r) => r.month.slice(0, 7), series: (r) => `${r.kind}:${r.reason}`, label: reasonLabel, value: (r) => r.count }, 'Other reasons');
  return (
    <ReportLayout
      generatedAt={generatedAt}
      timeZone={timeZone}
      figures={[
        { label: 'Coats recorded', value: report.coatCount },
        { label: 'Re-sprayed', value: count('repeated') },
        { label: 'Records corrected', value: count('corrected') },
        { label: 'Rework share', value: percentWords(total, report.coatCount) },
      ]}
      chart={
        <ChartFrame label="Stacked bar chart of coats re-sprayed or corrected per month, by reason. The table gives the same figures.">
          <StackedBarsChart data={data} series={series} unit="coats" digits={0} xWords={monthWords} />
        </ChartFrame>
      }
      table={<ReportTable caption="Coats re-sprayed or corrected per month, by reason" columns={columns} rows={rows} rowKey={(row) => `${row.month}-${row.kind}-${row.reason}`} footer={['Total', '', '', total]} />}
    />
  );
}

export function ReworkReport({ params, timeZone }: { params: ReportParams['rework']; timeZone: string }) {
  const query = useReworkReport(params);
  return (
    <ReportStatus query={query} what="the rework report">
      {(report) => <ReworkView report={report} generatedAt={query.dataUpdatedAt} timeZone={timeZone} />}
    </ReportStatus>
  );
}
