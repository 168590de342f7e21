import type { UnitSystem } from '../../../../shared/schemas/common';
import type { MaterialReport as Report } from '../../../../shared/schemas/report';
import { useMaterialReport } from '../../../api/reports/get-material-report';
import type { ReportParams } from '../../../api/reports/report-keys';
import { litresWords, shown, symbolOf } from '../utils/report-format';
import { ChartFrame } from './chart-frame';
import { ReportEmpty } from './report-empty';
import { MaterialChart } from './lazy-charts';
import { ReportLayout } from './report-layout';
import { ReportStatus } from './report-status';
import { ReportTable, type ReportColumn } from './report-table';

type JobRow = Report['rows'][number];
type ProductRow = Report['byProduct'][number];
interface ViewProps {
  report: Report;
  units: UnitSystem;
  generatedAt: number;
  timeZone: string;
}

/** Used against estimated as words a lead can act on: "+0.40 L (12 % over)". */
function differenceWords(estimatedL: number, usedL: number, units: UnitSystem) {
  const difference = usedL - estimatedL;
  const sign = difference > 0 ? '+' : difference < 0 ? '−' : '';
  const share = estimatedL > 0 ? ` (${Math.round((Math.abs(difference) / estimatedL) * 100)} % ${difference >= 0 ? 'over' : 'under'})` : '';
  const text = `${sign}${litresWords(Math.abs(difference), units)}${share}`;
  return estimatedL > 0 && difference / estimatedL > 0.1 ? <span className="font-semibold text-verdict-caution">{`${text} ⚠`}</span> : text;
}

function MaterialView({ report, units, generatedAt, timeZone }: ViewProps) {
  if (report.rows.length === 0) return <ReportEmpty title="No material mixed or estimated in this range">Each job’s estimated litres and the litres mixed for it appear here, per product.</ReportEmpty>;
  const products = [...report.byProduct].sort((a, b) => b.usedL - a.usedL || a.productName.localeCompare(b.productName));
  const jobs = [...report.rows].sort((a, b) => a.jobReference.localeCompare(b.jobReference) || a.productName.localeCompare(b.productName));
  const estimated = products.reduce((total, p) => total + p.estimatedL, 0);
  const used = products.reduce((total, p) => total + p.usedL, 0);
  const productColumns: ReportColumn<ProductRow>[] = [
    { header: 'Product', cell: (p) => p.productName },
    { header: 'Estimated', cell: (p) => litresWords(p.estimatedL, units), numeric: true },
    { header: 'Used', cell: (p) => litresWords(p.usedL, units), numeric: true },
    { header: 'Difference', cell: (p) => differenceWords(p.estimatedL, p.usedL, units), numeric: true },
  ];
  const jobColumns: ReportColumn<JobRow>[] = [
    { header: 'Job', cell: (r) => r.jobReference },
    { header: 'Customer', cell: (r) => r.customer },
    ...productColumns.map((column) => ({ ...column, cell: (r: JobRow) => column.cell(r) })),
  ];
  return (
    <ReportLayout
      generatedAt={generatedAt}
      timeZone={timeZone}
      figures={[
        { label: 'Estimated', value: litresWords(estimated, units) },
        { label: 'Used', value: litresWords(used, units) },
        { label: 'Difference', value: differenceWords(estimated, used, units) },
        { label: 'Jobs', value: new Set(jobs.map((r) => r.jobId)).size },
      ]}
      chart={
        <ChartFrame label="Bar chart of litres estimated and litres used for each product. The table gives the same figures.">
          <MaterialChart data={products.map((p) => ({ product: p.productName, estimated: shown(p.estimatedL, 'liquidVolume', units), used: shown(p.usedL, 'liquidVolume', units) }))} unit={symbolOf('liquidVolume', units)} />
        </ChartFrame>
      }
      table={<ReportTable caption="Material per product" columns={productColumns} rows={products} rowKey={(p) => String(p.productId)} footer={['Total', litresWords(estimated, units), litresWords(used, units), differenceWords(estimated, used, units)]} />}
      detail={
        <div className="space-y-2">
          <ReportTable caption="Material per job and product" columns={jobColumns} rows={jobs} rowKey={(r) => `${r.jobId}-${r.productId}`} />
          <p className="text-maple-800">Estimated: the ready-to-spray litres each job’s finish system needs with the default spray method. Used: the litres mixed, each pot shared among the jobs it coated by area. ⚠ marks more than 10 % over the estimate.</p>
        </div>
      }
    />
  );
}

export function MaterialReport({ params, units, timeZone }: { params: ReportParams['material']; units: UnitSystem; timeZone: string }) {
  const query = useMaterialReport(params);
  return (
    <ReportStatus query={query} what="the material report">
      {(report) => <MaterialView report={report} units={units} generatedAt={query.dataUpdatedAt} timeZone={timeZone} />}
    </ReportStatus>
  );
}
