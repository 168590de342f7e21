import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Denib } from '../../../../shared/schemas/denib';
import { formatQuantity } from '../../../../shared/units';
import type { CoatPhoto } from '../../../../shared/schemas/coat-photo';
import { Button } from '../../../components/ui/button';
import { formatShopDateTime } from '../../../lib/shop-time';
import { CoatPhotos } from './coat-photos';
import { denibEntryWords, logEntries } from './coat-log-entries';
import { conditionWords, filmWords, partsWords, sharedReason, stepWords, versionWords } from './coat-log-format';

interface CoatLogTableProps {
  coats: Coat[];
  /** Denibs that fall among these coats, shown in line as their own kind of row. */
  denibs: Denib[];
  units: UnitSystem;
  timeZone: string;
  onCorrect?: (coat: Coat) => void;
  photosOf: (coat: Coat) => CoatPhoto[];
  onOpenPhoto: (photo: CoatPhoto, coat: Coat) => void;
  onAddPhoto?: (coat: Coat) => void;
}

const headings = ['When (shop time)', 'Product, step, parts', 'Film', 'Conditions', 'Warnings', 'Who, version'];

function Warnings({ coat }: { coat: Coat }) {
  if (coat.warnings.length === 0) return <span className="text-maple-700">None</span>;
  const shared = sharedReason(coat);
  return (
    <>
      <ul className="min-w-44 space-y-1">
        {coat.warnings.map((w) => (
          <li key={w.code}>
            <span aria-hidden="true">⚠ </span>
            {w.message}
            {!shared && w.acknowledgedReason && <span className="block text-sm text-maple-800">Reason: {w.acknowledgedReason}</span>}
          </li>
        ))}
      </ul>
      {shared && <p className="mt-1 text-sm font-medium text-maple-800">Reason for the stops: {shared}</p>}
    </>
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

function DenibRow({ denib, timeZone }: { denib: Denib; timeZone: string }) {
  return (
    <tr aria-label={`Denib ${denib.id}`} className="border-b border-dashed border-maple-400 bg-maple-100 align-top last:border-b-0">
      <th scope="row" className="px-3 py-2 font-semibold">
        <span className="rounded-panel bg-maple-700 px-2 py-0.5 text-sm text-white">Denib</span>
        <span className="block whitespace-nowrap font-normal">{formatShopDateTime(denib.abradedAt, timeZone)}</span>
      </th>
      <td colSpan={4} className="px-3 py-2">
        {denibEntryWords(denib)}
        {denib.notes && <span className="block text-sm">{denib.notes}</span>}
      </td>
      <td className="px-3 py-2">{denib.recordedByName}</td>
    </tr>
  );
}

/** One row per coat version, and the denibs between them; a replaced version is struck through and names the record that corrects it. */
export function CoatLogTable({ coats, denibs, units, timeZone, onCorrect, photosOf, onOpenPhoto, onAddPhoto }: CoatLogTableProps) {
  return (
    <div role="region" aria-label="Coat records" tabIndex={0} className="overflow-x-auto rounded-panel border border-maple-300 bg-white">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Coat records and denibs, newest first</caption>
        <thead className="bg-maple-100">
          <tr>
            {headings.map((h) => (
              <th key={h} scope="col" className="whitespace-nowrap border-b border-maple-300 px-3 py-2 text-sm font-semibold text-maple-800">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {logEntries(coats, denibs).map((entry) => {
            if (entry.kind === 'denib') return <DenibRow key={`denib-${entry.denib.id}`} denib={entry.denib} timeZone={timeZone} />;
            const { coat } = entry;
            const replaced = coat.supersededById !== null;
            const struck = replaced ? 'line-through' : '';
            return (
              <tr key={coat.id} aria-label={`Coat ${coat.id}${replaced ? ', replaced' : ''}`} className={`border-b border-maple-200 align-top last:border-b-0 ${replaced ? 'bg-maple-100 text-maple-700' : 'even:bg-maple-50'}`}>
                <th scope="row" className={`px-3 py-2 font-semibold ${struck}`}>
                  #{coat.id}
                  <span className="block whitespace-nowrap font-normal">{formatShopDateTime(coat.sprayedAt, timeZone)}</span>
                </th>
                <td className={`min-w-40 px-3 py-2 ${struck}`}>
                  {coat.productName}
                  <span className="block text-sm">
                    {stepWords(coat)} · {partsWords(coat)}
                  </span>
                </td>
                <td className={`px-3 py-2 ${struck}`}>
                  {filmWords(coat, units)
                    .split(' → ')
                    .map((part) => (
                      <span key={part} className="block whitespace-nowrap">
                        {part}
                      </span>
                    ))}
                </td>
                <td className={`min-w-44 px-3 py-2 ${struck}`}>
                  {conditionWords(coat, units)}
                  <span className="block text-sm">Dew point {formatQuantity(coat.dewPointC, 'temperature', units)}</span>
                </td>
                <td className={`px-3 py-2 ${struck}`}>
                  <Warnings coat={coat} />
                </td>
                <td className="px-3 py-2">
                  <span className="block">{coat.recordedByName}</span>
                  <Version coat={coat} />
                  <CoatPhotos coat={coat} photos={photosOf(coat)} onOpen={onOpenPhoto} onAdd={replaced ? undefined : onAddPhoto} />
                  {onCorrect && !replaced && (
                    <div className="mt-2">
                      <Button variant="secondary" onClick={() => onCorrect(coat)} aria-label={`Correct coat ${coat.id}`}>
                        Correct
                      </Button>
                    </div>
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
