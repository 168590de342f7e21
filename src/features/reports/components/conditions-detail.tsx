import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ConditionsReport } from '../../../../shared/schemas/report';
import { formatShopDateTime } from '../../../lib/shop-time';
import { limitWords, outsideReasonWords, strictestLimits } from '../utils/conditions-words';
import { quantityWords } from '../utils/report-format';
import { ReportTable, type ReportColumn } from './report-table';

type Coat = ConditionsReport['coatsOutside'][number];
interface ConditionsDetailProps {
  report: ConditionsReport;
  units: UnitSystem;
  timeZone: string;
}

/** The limits the chart draws and where they come from, then every coat made outside them with the reasons in words. */
export function ConditionsDetail({ report, units, timeZone }: ConditionsDetailProps) {
  const limitOf = new Map(report.limits.map((limit) => [limit.productId, limit]));
  const strictest = strictestLimits(report.limits);
  const columns: ReportColumn<Coat>[] = [
    { header: 'Sprayed (shop time)', cell: (coat) => formatShopDateTime(coat.sprayedAt, timeZone) },
    { header: 'Product', cell: (coat) => coat.productName },
    { header: 'Air', cell: (coat) => quantityWords(coat.airTempC, 'temperature', units), numeric: true },
    { header: 'Surface', cell: (coat) => quantityWords(coat.surfaceTempC, 'temperature', units), numeric: true },
    { header: 'RH', cell: (coat) => `${Math.round(coat.relativeHumidityPct)} %`, numeric: true },
    {
      header: 'Why it is outside',
      cell: (coat) => (
        <ul className="min-w-56 list-inside list-disc">
          {outsideReasonWords(coat, limitOf.get(coat.productId), report.minDewPointMarginC, units).map((words) => (
            <li key={words}>{words}</li>
          ))}
        </ul>
      ),
    },
  ];
  return (
    <div className="space-y-4">
      <section aria-labelledby="limits-heading" className="rounded-panel border border-maple-300 bg-white p-4 print:break-inside-avoid">
        <h3 id="limits-heading" className="font-semibold text-lacquer-900">
          Limits drawn on the chart
        </h3>
        {report.limits.length === 0 ? (
          <p className="text-maple-800">No coats were sprayed in this booth in the range, so only the dew-point margin applies.</p>
        ) : (
          <ul className="mt-1 space-y-1 text-maple-900">
            {report.limits.map((limit) => (
              <li key={limit.productId}>
                <span className="font-semibold">{limit.productName}</span>: {limitWords(limit, units)}
                {(strictest.minTempC === limit || strictest.maxRh === limit) && <span className="text-maple-700"> (strictest, drawn)</span>}
              </li>
            ))}
          </ul>
        )}
        <p className="mt-1 text-maple-800">The surface must stay at least {quantityWords(report.minDewPointMarginC, 'temperatureDifference', units)} above the dew point.</p>
      </section>
      {report.coatsOutside.length === 0 ? (
        <p className="rounded-panel border-2 border-verdict-go bg-white p-4 font-semibold text-verdict-go">Every coat in this range was sprayed within its product’s limits and the dew-point margin.</p>
      ) : (
        <ReportTable caption={`Coats sprayed outside limits (${report.coatsOutside.length} of ${report.coatCount})`} columns={columns} rows={report.coatsOutside} rowKey={(coat) => String(coat.coatId)} />
      )}
    </div>
  );
}
