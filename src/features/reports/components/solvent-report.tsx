import type { UnitSystem } from '../../../../shared/schemas/common';
import type { SolventReport as Report } from '../../../../shared/schemas/report';
import { useSolventReport } from '../../../api/reports/get-solvent-report';
import type { ReportParams } from '../../../api/reports/report-keys';
import { litresWords, percentWords, vocShown, vocUnit, vocWords } from '../utils/report-format';
import { monthWords } from '../utils/report-range';
import { everyMonth } from '../utils/solvent-months';
import { ChartFrame } from './chart-frame';
import { ReportEmpty } from './report-empty';
import { SolventChart } from './lazy-charts';
import { ReportLayout } from './report-layout';
import { ReportStatus } from './report-status';
import { ReportTable, type ReportColumn } from './report-table';

type Month = Report['rows'][number];
interface ViewProps {
  report: Report;
  units: UnitSystem;
  generatedAt: number;
  timeZone: string;
}

function SolventView({ report, units, generatedAt, timeZone }: ViewProps) {
  if (report.rows.every((row) => row.litres === 0)) return <ReportEmpty title="No mixes recorded in this range">Litres mixed and the VOC they give off appear here month by month, from the mixes recorded in spray sessions.</ReportEmpty>;
  const months = everyMonth(report);
  const litres = months.reduce((total, m) => total + m.litres, 0);
  const withoutVoc = months.reduce((total, m) => total + m.litresWithoutVoc, 0);
  const yearToDate = months.at(-1)?.runningTotalKg ?? 0;
  const threshold = report.thresholdKg > 0 ? report.thresholdKg : null;
  const over = threshold !== null && months.some((m) => m.runningTotalKg > threshold);
  const columns: ReportColumn<Month>[] = [
    { header: 'Month', cell: (m) => monthWords(m.month) },
    { header: 'Mixed', cell: (m) => litresWords(m.litres, units), numeric: true },
    { header: 'VOC', cell: (m) => vocWords(m.vocKg, units), numeric: true },
    { header: 'Year so far', cell: (m) => (threshold !== null && m.runningTotalKg > threshold ? <span className="font-semibold text-verdict-stop">{vocWords(m.runningTotalKg, units)} ⚠ over</span> : vocWords(m.runningTotalKg, units)), numeric: true },
    { header: 'Mixed without a VOC figure', cell: (m) => (m.litresWithoutVoc > 0 ? litresWords(m.litresWithoutVoc, units) : '–'), numeric: true },
  ];
  return (
    <ReportLayout
      generatedAt={generatedAt}
      timeZone={timeZone}
      figures={[
        { label: 'VOC in this range', value: vocWords(report.totalKg, units) },
        { label: 'Litres mixed', value: litresWords(litres, units) },
        { label: `Year so far (${months.at(-1)?.month.slice(0, 4)})`, value: threshold === null ? vocWords(yearToDate, units) : `${vocWords(yearToDate, units)} · ${percentWords(yearToDate, threshold)}`, alert: over },
        { label: 'Yearly threshold', value: threshold === null ? 'Not set' : vocWords(threshold, units) },
      ]}
      chart={
        <ChartFrame label="Bar chart of VOC given off per month, with a line for the running total of the year and the yearly threshold. The table gives the same figures.">
          <SolventChart data={months.map((m) => ({ x: m.month, voc: vocShown(m.vocKg, units), running: vocShown(m.runningTotalKg, units) }))} threshold={threshold === null ? null : vocShown(threshold, units)} unit={vocUnit(units)} />
        </ChartFrame>
      }
      table={<ReportTable caption="Solvent and VOC per month" columns={columns} rows={months} rowKey={(m) => m.month} footer={['Total', litresWords(litres, units), vocWords(report.totalKg, units), '', withoutVoc > 0 ? litresWords(withoutVoc, units) : '–']} />}
      detail={
        <div className="space-y-1 text-maple-800">
          <p>VOC is litres mixed (ready to spray) times each product’s VOC as applied. The running total starts again each January.</p>
          {threshold === null && <p>No yearly threshold is set: the owner can set one in Shop settings.</p>}
          {withoutVoc > 0 && <p className="font-semibold text-verdict-caution">⚠ {litresWords(withoutVoc, units)} were mixed of products whose data sheet gives no VOC figure; they are not in the VOC totals. Add the figure to those data sheets.</p>}
        </div>
      }
    />
  );
}

export function SolventReport({ params, units, timeZone }: { params: ReportParams['solvent']; units: UnitSystem; timeZone: string }) {
  const query = useSolventReport(params);
  return (
    <ReportStatus query={query} what="the solvent report">
      {(report) => <SolventView report={report} units={units} generatedAt={query.dataUpdatedAt} timeZone={timeZone} />}
    </ReportStatus>
  );
}
