import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity } from '../../../../shared/units';
import { Button } from '../../../components/ui/button';
import { formatShopDateTime } from '../../../lib/shop-time';
import { conditionWords, filmWords, partsWords, stepWords, versionWords } from './coat-log-format';

interface CoatLogTableProps {
  coats: Coat[];
  units: UnitSystem;
  timeZone: string;
  onCorrect?: (coat: Coat) => void;
}

const headings = ['When (shop time)', 'Parts', 'Product', 'Step', 'Film', 'Conditions', 'Dew point', 'Warnings', 'Who', 'Version', ''];

function Warnings({ coat }: { coat: Coat }) {
  if (coat.warnings.length === 0) return <span className="text-maple-700">None</span>;
  return (
    <ul className="min-w-56 space-y-1">
      {coat.warnings.map((w) => (
        <li key={w.code}>
          <span aria-hidden="true">⚠ </span>
          {w.message}
          {w.acknowledgedReason && <span className="block text-sm text-maple-800">Reason: {w.acknowledgedReason}</span>}
        </li>
      ))}
    </ul>
  );
}

function Version({ coat }: { coat: Coat }) {
  return (
    <>
      <span className="whitespace-nowrap font-semibold">{versionWords(coat)}</span>
      {coat.correctionReason && <span className="block min-w-40 text-sm">Why: {coat.correctionReason}</span>}
      {coat.supersededById !== null && <span className="block whitespace-nowrap text-sm font-bold text-verdict-stop no-underline">Corrected by #{coat.supersededById}</span>}
    </>
  );
}

/** One row per coat version; a replaced version is struck through and names the record that corrects it. */
export function CoatLogTable({ coats, units, timeZone, onCorrect }: CoatLogTableProps) {
  return (
    <div role="region" aria-label="Coat records" tabIndex={0} className="overflow-x-auto rounded-panel border border-maple-300 bg-white">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Coat records, newest first</caption>
        <thead className="bg-maple-100">
          <tr>
            {headings.map((h, i) => (
              <th key={h || i} scope="col" className="whitespace-nowrap border-b border-maple-300 px-3 py-2 text-sm font-semibold text-maple-800">
                {h || <span className="sr-only">Actions</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {coats.map((coat) => {
            const replaced = coat.supersededById !== null;
            return (
              <tr key={coat.id} aria-label={`Coat ${coat.id}${replaced ? ', replaced' : ''}`} className={`border-b border-maple-200 align-top last:border-b-0 ${replaced ? 'bg-maple-100 text-maple-700' : 'even:bg-maple-50'}`}>
                <th scope="row" className={`whitespace-nowrap px-3 py-2 font-semibold ${replaced ? 'line-through' : ''}`}>
                  #{coat.id} · {formatShopDateTime(coat.sprayedAt, timeZone)}
                </th>
                <td className={`whitespace-nowrap px-3 py-2 ${replaced ? 'line-through' : ''}`}>{partsWords(coat)}</td>
                <td className={`min-w-40 px-3 py-2 ${replaced ? 'line-through' : ''}`}>{coat.productName}</td>
                <td className={`whitespace-nowrap px-3 py-2 ${replaced ? 'line-through' : ''}`}>{stepWords(coat)}</td>
                <td className={`whitespace-nowrap px-3 py-2 ${replaced ? 'line-through' : ''}`}>{filmWords(coat, units)}</td>
                <td className={`min-w-48 px-3 py-2 ${replaced ? 'line-through' : ''}`}>{conditionWords(coat, units)}</td>
                <td className={`whitespace-nowrap px-3 py-2 ${replaced ? 'line-through' : ''}`}>{formatQuantity(coat.dewPointC, 'temperature', units)}</td>
                <td className={`px-3 py-2 ${replaced ? 'line-through' : ''}`}>
                  <Warnings coat={coat} />
                </td>
                <td className="whitespace-nowrap px-3 py-2">{coat.recordedByName}</td>
                <td className="px-3 py-2">
                  <Version coat={coat} />
                </td>
                <td className="px-3 py-2">
                  {onCorrect && !replaced && (
                    <Button variant="secondary" onClick={() => onCorrect(coat)} aria-label={`Correct coat ${coat.id}`}>
                      Correct
                    </Button>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
