import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Denib } from '../../../../shared/schemas/denib';
import { formatQuantity } from '../../../../shared/units';
import { coatPlaceWords, partLabelsWords, type ShopFormat } from '../../../../shared/words';
import type { CoatPhoto } from '../../../../shared/schemas/coat-photo';
import { useShopFormat } from '../../../api/settings/use-shop-format';
import { Button } from '../../../components/ui/button';
import { formatShopDateTime } from '../../../lib/shop-time';
import { CoatPhotos } from './coat-photos';
import { denibEntryWords, denibRowWords, logEntries } from './coat-log-entries';
import { coatRowWords, correctedByWords, filmWords, versionWords } from './coat-log-format';
import { WarningChips } from './warning-chips';

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

const headings = ['When (shop time)', 'Job', 'Product, coat, parts', 'Film', 'Conditions', 'Warnings', 'Who, version'];

/** Day above time, so the column stays narrow. */
function When({ iso, timeZone }: { iso: string; timeZone: string }) {
  const words = formatShopDateTime(iso, timeZone);
  const [day, time] = words.split(', ');
  return time ? (
    <>
      <span className="block whitespace-nowrap">{day}</span>
      <span className="block">{time}</span>
    </>
  ) : (
    <>{words}</>
  );
}

function Version({ coat }: { coat: Coat }) {
  return (
    <>
      <span className="whitespace-nowrap">
        {coat.recordedByName} · <span className="font-semibold">{versionWords(coat)}</span>
      </span>
      {coat.correctionReason && <span className="block min-w-40 text-sm">Why: {coat.correctionReason}</span>}
      {coat.supersededById !== null && (
        <span className="block whitespace-nowrap text-sm font-bold text-verdict-stop no-underline">
          {correctedByWords(coat)}
        </span>
      )}
    </>
  );
}

function DenibRow({ denib, timeZone, shop }: { denib: Denib; timeZone: string; shop: ShopFormat }) {
  return (
    <tr
      aria-label={denibRowWords(denib, shop)}
      className="border-b border-dashed border-maple-400 bg-maple-100 align-top last:border-b-0"
    >
      <th scope="row" className="px-2 py-2 text-sm font-normal">
        <span className="rounded-panel bg-maple-700 px-2 py-0.5 font-semibold text-white">Denib</span>
        <When iso={denib.abradedAt} timeZone={timeZone} />
      </th>
      <td colSpan={5} className="px-2 py-2">
        {denibEntryWords(denib)}
        {denib.notes && <span className="block text-sm">{denib.notes}</span>}
      </td>
      <td className="px-2 py-2 text-sm">{denib.recordedByName}</td>
    </tr>
  );
}

function CoatRow({
  coat,
  units,
  timeZone,
  shop,
  onCorrect,
  photosOf,
  onOpenPhoto,
  onAddPhoto,
}: Omit<CoatLogTableProps, 'coats' | 'denibs'> & { coat: Coat; shop: ShopFormat }) {
  const replaced = coat.supersededById !== null;
  const struck = replaced ? 'line-through' : '';
  const name = coatRowWords(coat, shop);
  const temp = (c: number) => formatQuantity(c, 'temperature', units);
  return (
    <tr
      aria-label={`${name}${replaced ? ', replaced' : ''}`}
      className={`border-b border-maple-200 align-top last:border-b-0 ${replaced ? 'bg-maple-100 text-maple-700' : 'even:bg-maple-50'}`}
    >
      <th scope="row" className={`px-2 py-2 text-sm font-normal ${struck}`}>
        <When iso={coat.sprayedAt} timeZone={timeZone} />
      </th>
      <td className={`min-w-28 max-w-40 px-2 py-2 font-semibold [overflow-wrap:anywhere] ${struck}`}>
        {coat.jobReference ?? '—'}
      </td>
      <td className={`min-w-52 px-2 py-2 ${struck}`}>
        <span className="block leading-snug">{coat.productName}</span>
        <span className="block text-sm leading-snug">
          <span className="font-semibold">{coatPlaceWords(coat)}</span> · {partLabelsWords(coat.partLabels)}
        </span>
      </td>
      <td className={`px-2 py-2 text-sm ${struck}`}>
        {filmWords(coat, units)
          .split(' → ')
          .map((part) => (
            <span key={part} className="block whitespace-nowrap">
              {part}
            </span>
          ))}
      </td>
      <td className={`px-2 py-2 text-sm ${struck}`}>
        <span className="block whitespace-nowrap">
          Air {temp(coat.airTempC)} · RH {coat.relativeHumidityPct} %
        </span>
        <span className="block whitespace-nowrap">Surface {temp(coat.surfaceTempC)}</span>
        <span className="block whitespace-nowrap">Dew point {temp(coat.dewPointC)}</span>
      </td>
      <td className={`px-2 py-2 ${struck}`}>
        <WarningChips coat={coat} size="table" />
      </td>
      <td className="px-2 py-2 text-sm">
        <Version coat={coat} />
        <div className="flex items-start whitespace-nowrap">
          <CoatPhotos
            coat={coat}
            photos={photosOf(coat)}
            onOpen={onOpenPhoto}
            onAdd={replaced ? undefined : onAddPhoto}
            compact
          />
          {onCorrect && !replaced && (
            <Button variant="quiet" className="px-2!" onClick={() => onCorrect(coat)} aria-label={`Correct ${name}`}>
              Correct
            </Button>
          )}
        </div>
      </td>
    </tr>
  );
}

/** One row per coat version, and the denibs between them; a replaced version is struck through and names the version that corrects it. */
export function CoatLogTable({ coats, denibs, ...rest }: CoatLogTableProps) {
  const shop = { ...useShopFormat(), timeZone: rest.timeZone };
  return (
    <div
      role="region"
      aria-label="Coat records"
      tabIndex={0}
      className="overflow-x-auto rounded-panel border border-maple-300 bg-white"
    >
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Coat records and denibs, newest first</caption>
        <thead className="bg-maple-100">
          <tr>
            {headings.map((h) => (
              <th
                key={h}
                scope="col"
                className="whitespace-nowrap border-b border-maple-300 px-2 py-2 text-sm font-semibold text-maple-800"
              >
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {logEntries(coats, denibs).map((entry) =>
            entry.kind === 'denib' ? (
              <DenibRow key={`denib-${entry.denib.id}`} denib={entry.denib} timeZone={rest.timeZone} shop={shop} />
            ) : (
              <CoatRow key={entry.coat.id} coat={entry.coat} shop={shop} {...rest} />
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}
