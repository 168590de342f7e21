import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Denib } from '../../../../shared/schemas/denib';
import { formatQuantity } from '../../../../shared/units';
import type { CoatPhoto } from '../../../../shared/schemas/coat-photo';
import { coatPlaceWords, partLabelsWords } from '../../../../shared/words';
import { useShopFormat } from '../../../api/settings/use-shop-format';
import { Button } from '../../../components/ui/button';
import { formatShopDateTime } from '../../../lib/shop-time';
import { CoatPhotos } from './coat-photos';
import { denibEntryWords, denibRowWords, logEntries } from './coat-log-entries';
import { coatRowWords, conditionWords, correctedByWords, filmWords, versionWords } from './coat-log-format';
import { WarningChips } from './warning-chips';

interface CoatLogCardsProps {
  coats: Coat[];
  denibs: Denib[];
  units: UnitSystem;
  timeZone: string;
  onCorrect?: (coat: Coat) => void;
  photosOf: (coat: Coat) => CoatPhoto[];
  onOpenPhoto: (photo: CoatPhoto, coat: Coat) => void;
  onAddPhoto?: (coat: Coat) => void;
}

/** The same records as the table, one card each, for tablets and phones where eleven columns do not fit. */
export function CoatLogCards({ coats, denibs, units, timeZone, onCorrect, photosOf, onOpenPhoto, onAddPhoto }: CoatLogCardsProps) {
  const shop = { ...useShopFormat(), timeZone };
  return (
    <ul aria-label="Coat records" className="space-y-3">
      {logEntries(coats, denibs).map((entry) => {
        if (entry.kind === 'denib') {
          const { denib } = entry;
          return (
            <li key={`denib-${denib.id}`} aria-label={denibRowWords(denib, shop)} className="rounded-panel border-2 border-dashed border-maple-500 bg-maple-100 p-4">
              <p className="text-lg font-bold">
                <span className="mr-2 rounded-panel bg-maple-700 px-2 py-0.5 text-sm text-white">Denib</span>
                {formatShopDateTime(denib.abradedAt, timeZone)}
              </p>
              <p className="font-semibold">{denibEntryWords(denib)}</p>
              {denib.notes && <p>{denib.notes}</p>}
              <p className="mt-1 text-maple-800">{denib.recordedByName}</p>
            </li>
          );
        }
        const { coat } = entry;
        const replaced = coat.supersededById !== null;
        const name = coatRowWords(coat, shop);
        return (
          <li key={coat.id} aria-label={`${name}${replaced ? ', replaced' : ''}`} className={`rounded-panel border-2 p-4 ${replaced ? 'border-maple-300 bg-maple-100 text-maple-700' : 'border-maple-300 bg-white'}`}>
            <div className={replaced ? 'line-through' : ''}>
              <p className="text-lg font-bold">
                {coat.jobReference ?? 'No job'} · {formatShopDateTime(coat.sprayedAt, timeZone)}
              </p>
              <p className="font-semibold">
                {coat.productName} · {coatPlaceWords(coat)} · {partLabelsWords(coat.partLabels)}
              </p>
              <p>{filmWords(coat, units)}</p>
              <p>
                {conditionWords(coat, units)}, dew point {formatQuantity(coat.dewPointC, 'temperature', units)}
              </p>
              {coat.warnings.length > 0 && (
                <div className="mt-1">
                  <WarningChips coat={coat} size="touch" />
                </div>
              )}
            </div>
            <p className="mt-1 text-maple-800">
              {coat.recordedByName} · {versionWords(coat)}
              {coat.correctionReason && <span className="block">Why: {coat.correctionReason}</span>}
            </p>
            {replaced && <p className="font-bold text-verdict-stop">{correctedByWords(coat)}</p>}
            <CoatPhotos coat={coat} photos={photosOf(coat)} onOpen={onOpenPhoto} onAdd={replaced ? undefined : onAddPhoto} />
            {onCorrect && !replaced && (
              <Button variant="secondary" className="mt-2" onClick={() => onCorrect(coat)} aria-label={`Correct ${name}`}>
                Correct
              </Button>
            )}
          </li>
        );
      })}
    </ul>
  );
}
