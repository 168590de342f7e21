import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ConditionsReport as Report } from '../../../../shared/schemas/report';
import { EmptyState } from '../../../components/ui/states';
import { ReportEmpty } from './report-empty';
import { useConditionsReport } from '../../../api/reports/get-conditions-report';
import type { ReportParams } from '../../../api/reports/report-keys';
import { strictestLimits } from '../utils/conditions-words';
import { quantityWords, shown, symbolOf } from '../utils/report-format';
import { ChartFrame } from './chart-frame';
import { ConditionsDetail } from './conditions-detail';
import { ConditionsChart } from './lazy-charts';
import { ReportLayout } from './report-layout';
import { ReportStatus } from './report-status';
import { ReportTable, type ReportColumn } from './report-table';

type Point = Report['points'][number];
interface ViewProps {
  report: Report;
  units: UnitSystem;
  generatedAt: number;
  timeZone: string;
}

function timeFormats(bucket: Report['bucket'], timeZone: string) {
  const long = new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short', year: 'numeric', ...(bucket === 'hour' ? { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' } : {}) });
  const tick = new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short', ...(bucket === 'hour' ? { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' } : {}) });
  return { long: (t: number) => long.format(t), tick: (t: number) => tick.format(t) };
}

/** A figure with a plain-words flag when it breaks the strictest limit, so the table shows what the chart's lines show. */
const flagged = (text: string, outside: boolean, words: string) => (outside ? <span className="font-semibold text-verdict-stop">{`${text} ⚠ ${words}`}</span> : text);

function extremes(points: Point[], units: UnitSystem) {
  if (points.length === 0) return { air: '–', rh: '–', margin: '–' };
  const airs = points.map((p) => p.airTempC);
  const range = `${quantityWords(Math.min(...airs), 'temperature', units)} to ${quantityWords(Math.max(...airs), 'temperature', units)}`;
  return {
    air: range,
    rh: `${Math.round(Math.max(...points.map((p) => p.relativeHumidityPct)))} %`,
    margin: quantityWords(Math.min(...points.map((p) => p.dewPointMarginC)), 'temperatureDifference', units),
  };
}

function ConditionsView({ report, units, generatedAt, timeZone }: ViewProps) {
  if (report.points.length === 0 && report.coatCount === 0) {
    return <ReportEmpty title={`No readings or coats for ${report.boothName} in this range`}>Readings (typed in or sent by a sensor) and the conditions recorded with each coat appear here.</ReportEmpty>;
  }
  const strictest = strictestLimits(report.limits);
  const minTempC = strictest.minTempC?.minApplicationTempC ?? null;
  const maxRh = strictest.maxRh?.maxRelativeHumidityPct ?? null;
  const times = timeFormats(report.bucket, timeZone);
  const temperature = symbolOf('temperature', units);
  const { air, rh, margin } = extremes(report.points, units);
  const columns: ReportColumn<Point>[] = [
    { header: report.bucket === 'hour' ? 'Hour' : 'Day', cell: (p) => times.long(Date.parse(p.at)) },
    { header: 'Readings', cell: (p) => p.readings, numeric: true },
    { header: `Air ${temperature}`, cell: (p) => flagged(quantityWords(p.airTempC, 'temperature', units), minTempC !== null && p.airTempC < minTempC, 'below min.'), numeric: true },
    { header: 'RH', cell: (p) => flagged(`${Math.round(p.relativeHumidityPct)} %`, maxRh !== null && p.relativeHumidityPct > maxRh, 'above max.'), numeric: true },
    { header: 'Dew-point margin', cell: (p) => flagged(quantityWords(p.dewPointMarginC, 'temperatureDifference', units), p.dewPointMarginC < report.minDewPointMarginC, 'too small'), numeric: true },
  ];
  return (
    <ReportLayout
      generatedAt={generatedAt}
      timeZone={timeZone}
      figures={[
        { label: `Coats sprayed in ${report.boothName}`, value: report.coatCount },
        { label: 'Coats outside limits', value: report.coatsOutside.length, alert: report.coatsOutside.length > 0 },
        { label: 'Air temperature', value: air },
        { label: 'Highest RH · smallest dew-point margin', value: `${rh} · ${margin}` },
      ]}
      chart={
        <ChartFrame label={`Line chart of air temperature, relative humidity and dew-point margin in ${report.boothName}, with the product limits and ${report.coatsOutside.length} coats outside them marked. The tables give the same figures.`}>
          <ConditionsChart
            points={report.points.map((p) => ({ t: Date.parse(p.at), air: shown(p.airTempC, 'temperature', units), rh: p.relativeHumidityPct, margin: shown(p.dewPointMarginC, 'temperatureDifference', units) }))}
            outside={report.coatsOutside.map((c) => ({ t: Date.parse(c.sprayedAt), air: shown(c.airTempC, 'temperature', units) }))}
            limits={{ minTemp: minTempC === null ? null : shown(minTempC, 'temperature', units), maxRh, minMargin: shown(report.minDewPointMarginC, 'temperatureDifference', units) }}
            temperatureUnit={temperature}
            timeWords={times.long}
            tickWords={times.tick}
          />
        </ChartFrame>
      }
      table={
        report.points.length > 0 ? (
          <ReportTable caption={`Conditions in ${report.boothName} per ${report.bucket} (averages; smallest margin)`} columns={columns} rows={report.points} rowKey={(p) => p.at} />
        ) : (
          <EmptyState title="No readings in this range">Only the conditions recorded with the coats are known; they are checked below.</EmptyState>
        )
      }
      detail={<ConditionsDetail report={report} units={units} timeZone={timeZone} />}
    />
  );
}

export function ConditionsReport({ params, units, timeZone }: { params: ReportParams['conditions']; units: UnitSystem; timeZone: string }) {
  const query = useConditionsReport(params);
  return (
    <ReportStatus query={query} what="the conditions report">
      {(report) => <ConditionsView report={report} units={units} generatedAt={query.dataUpdatedAt} timeZone={timeZone} />}
    </ReportStatus>
  );
}
