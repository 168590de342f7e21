import type { UpkeepReport as Report } from '../../../../shared/schemas/report';
import { useUpkeepReport } from '../../../api/reports/get-upkeep-report';
import type { ReportParams } from '../../../api/reports/report-keys';
import { ReportEmpty } from './report-empty';
import { ReportLayout } from './report-layout';
import { ReportStatus } from './report-status';
import { ReportTable, type ReportColumn } from './report-table';

type Row = Report['rows'][number];

const kindWords: Record<Row['kind'], string> = {
  'filter-change': 'Filter changes',
  'extraction-test': 'Extraction tests',
  'fire-inspection': 'Fire-protection inspections',
  'fit-test': 'Face-fit tests',
  'health-surveillance': 'Health surveillance',
  training: 'Training',
};

const notDone = (row: Row) => (row.due === null || row.doneByDue === null ? null : row.due - row.doneByDue);

const columns: ReportColumn<Row>[] = [
  { header: 'Booth', cell: (row) => row.boothName ?? 'Crew (all people)' },
  { header: 'Upkeep', cell: (row) => kindWords[row.kind] },
  { header: 'Done in range', cell: (row) => row.done, numeric: true },
  { header: 'Fell due in range', cell: (row) => (row.due === null ? 'on the gauge' : row.due), numeric: true },
  { header: 'Done again by the due date', cell: (row) => row.doneByDue ?? '—', numeric: true },
  { header: 'Late or still to do', cell: (row) => notDone(row) ?? '—', numeric: true },
];

function UpkeepView({ report, generatedAt, timeZone }: { report: Report; generatedAt: number; timeZone: string }) {
  const total = (pick: (row: Row) => number | null) => report.rows.reduce((sum, row) => sum + (pick(row) ?? 0), 0);
  if (report.rows.every((row) => row.done === 0 && !row.due)) {
    return <ReportEmpty title="No upkeep done or due in this range">Filter changes, extraction tests, fire-protection inspections and crew records appear here as they are recorded under Booth upkeep and Crew records.</ReportEmpty>;
  }
  const late = total(notDone);
  return (
    <ReportLayout
      generatedAt={generatedAt}
      timeZone={timeZone}
      tableBeside={false}
      figures={[
        { label: 'Filter changes', value: total((row) => (row.kind === 'filter-change' ? row.done : 0)) },
        { label: 'Tests and inspections done', value: total((row) => (row.kind === 'extraction-test' || row.kind === 'fire-inspection' ? row.done : 0)) },
        { label: 'Fell due', value: total((row) => row.due) },
        { label: 'Late or still to do', value: late, alert: late > 0 },
      ]}
      chart={null}
      table={<ReportTable caption="Upkeep done in the range and upkeep that fell due, per booth, with the crew as counts" columns={columns} rows={report.rows} rowKey={(row) => `${row.boothId ?? 'crew'}-${row.kind}`} />}
    />
  );
}

export function UpkeepReport({ params, timeZone }: { params: ReportParams['upkeep']; timeZone: string }) {
  const query = useUpkeepReport(params);
  return (
    <ReportStatus query={query} what="the upkeep report">
      {(report) => <UpkeepView report={report} generatedAt={query.dataUpdatedAt} timeZone={timeZone} />}
    </ReportStatus>
  );
}
