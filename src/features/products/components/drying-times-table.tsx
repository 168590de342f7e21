import type { DryingRow } from '../../../../shared/finishing/drying-row-schema';
import { formatHours, formatMinutes } from '../../../lib/durations';
import { formatNumber } from '../../../lib/units-display';

/** The saved drying table as the data sheet gives it, read-only, coldest row first. */
export function DryingTimesTable({ rows }: { rows: DryingRow[] }) {
  const sorted = [...rows].sort((a, b) => a.tempC - b.tempC);
  return (
    <div className="overflow-x-auto rounded-panel border border-maple-300 bg-white">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Drying times at each temperature on the data sheet</caption>
        <thead className="bg-maple-100 text-sm">
          <tr>
            {['Temperature', 'Flash-off', 'Recoat from', 'Recoat until', 'Touch dry', 'Handle', 'Pack', 'Full cure'].map((title) => (
              <th key={title} scope="col" className="whitespace-nowrap px-3 py-2 font-semibold">
                {title}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {sorted.map((row) => (
            <tr key={row.tempC} className="border-t border-maple-200">
              <th scope="row" className="whitespace-nowrap px-3 py-2 font-semibold">
                {formatNumber(row.tempC)} °C
              </th>
              <td className="whitespace-nowrap px-3 py-2">{formatMinutes(row.flashOffMin)}</td>
              <td className="whitespace-nowrap px-3 py-2">{formatMinutes(row.recoatMinMin)}</td>
              <td className="whitespace-nowrap px-3 py-2">{row.recoatMaxMin === null ? 'No limit' : formatMinutes(row.recoatMaxMin)}</td>
              <td className="whitespace-nowrap px-3 py-2">{formatMinutes(row.touchDryMin)}</td>
              <td className="whitespace-nowrap px-3 py-2">{formatMinutes(row.handleMin)}</td>
              <td className="whitespace-nowrap px-3 py-2">{formatMinutes(row.packMin)}</td>
              <td className="whitespace-nowrap px-3 py-2">{formatHours(row.fullCureH)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
