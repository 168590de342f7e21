import type { BoothUseReport as Report } from '../../../../shared/schemas/report';
import { useBoothUseReport } from '../../../api/reports/get-booth-use-report';
import type { ReportParams } from '../../../api/reports/report-keys';
import { hoursWords, percentWords } from '../utils/report-format';
import { weekWords } from '../utils/report-range';
import { weeksIn, type ChartRow } from '../utils/report-series';
import { ChartFrame } from './chart-frame';
import { ReportEmpty } from './report-empty';
import { BoothUseChart } from './lazy-charts';
import { ReportLayout } from './report-layout';
import { ReportStatus } from './report-status';
import { ReportTable, type ReportColumn } from './report-table';

type Row = Report['rows'][number];

const columns: ReportColumn<Row>[] = [
  { header: 'Week', cell: (row) => weekWords(row.weekStart) },
  { header: 'Booth', cell: (row) => row.boothName },
  { header: 'Sessions', cell: (row) => row.sessions, numeric: true },
  { header: 'Booked', cell: (row) => hoursWords(row.bookedHours), numeric: true },
  { header: 'Sprayed', cell: (row) => hoursWords(row.sprayedHours), numeric: true },
  { header: 'Sprayed of booked', cell: (row) => percentWords(row.sprayedHours, row.bookedHours), numeric: true },
];

function boothsOf(rows: Row[]) {
  const byId = new Map(rows.map((row) => [row.boothId, row.boothName]));
  return [...byId].map(([id, name]) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name));
}

/** One chart row per week of the range, with booked and sprayed hours for each booth (0 for a quiet week). */
function chartRows(report: Report): ChartRow[] {
  const weeks = new Map<string, ChartRow>(weeksIn(report).map((week) => [week, { x: week }]));
  for (const row of report.rows) {
    const week = weeks.get(row.weekStart) ?? { x: row.weekStart };
    week[`b${row.boothId}booked`] = row.bookedHours;
    week[`b${row.boothId}sprayed`] = row.sprayedHours;
    weeks.set(row.weekStart, week);
  }
  return [...weeks.values()].sort((a, b) => String(a.x).localeCompare(String(b.x)));
}

function BoothUseView({ report, generatedAt, timeZone }: { report: Report; generatedAt: number; timeZone: string }) {
  // The server lists every week of every booth, quiet ones included: empty means nothing booked at all.
  if (report.rows.every((row) => row.sessions === 0 && row.bookedHours === 0 && row.sprayedHours === 0)) {
    return <ReportEmpty title="No spray sessions in this range">Booked spray sessions, and the time spent spraying in them, appear here week by week.</ReportEmpty>;
  }
  const rows = [...report.rows].sort((a, b) => a.weekStart.localeCompare(b.weekStart) || a.boothName.localeCompare(b.boothName));
  const sum = (pick: (row: Row) => number) => rows.reduce((total, row) => total + pick(row), 0);
  const [sessions, booked, sprayed] = [sum((r) => r.sessions), sum((r) => r.bookedHours), sum((r) => r.sprayedHours)];
  return (
    <ReportLayout
      generatedAt={generatedAt}
      timeZone={timeZone}
      figures={[
        { label: 'Spray sessions', value: sessions },
        { label: 'Hours booked', value: hoursWords(booked) },
        { label: 'Hours sprayed', value: hoursWords(sprayed) },
        { label: 'Sprayed of booked', value: percentWords(sprayed, booked) },
      ]}
      chart={
        <ChartFrame label="Bar chart of hours booked and hours sprayed per week for each booth. The table gives the same figures.">
          <BoothUseChart data={chartRows(report)} booths={boothsOf(rows)} />
        </ChartFrame>
      }
      table={
        <ReportTable
          caption="Hours booked and sprayed per booth and week"
          columns={columns}
          rows={rows}
          rowKey={(row) => `${row.weekStart}-${row.boothId}`}
          footer={['Total', '', sessions, hoursWords(booked), hoursWords(sprayed), percentWords(sprayed, booked)]}
        />
      }
    />
  );
}

export function BoothUseReport({ params, timeZone }: { params: ReportParams['booth-use']; timeZone: string }) {
  const query = useBoothUseReport(params);
  return (
    <ReportStatus query={query} what="the booth use report">
      {(report) => <BoothUseView report={report} generatedAt={query.dataUpdatedAt} timeZone={timeZone} />}
    </ReportStatus>
  );
}
