import { hazardLabels, type Hazard, type Lot, type Product } from '../../../../shared/schemas/product';
import { fileHref } from '../../../api/files/file-href';
import { documentTitles } from './product-format';

export function HazardWords({ hazards }: { hazards: Hazard[] }) {
  if (hazards.length === 0) return <span className="text-maple-700">None flagged</span>;
  return (
    <ul className="space-y-0.5 text-sm">
      {hazards.map((hazard) => (
        <li key={hazard} className="min-w-24 font-medium text-verdict-caution">
          <span aria-hidden="true">⚠ </span>
          {hazardLabels[hazard]}
        </li>
      ))}
    </ul>
  );
}

export function ExpiredBadge() {
  return (
    <span className="inline-block whitespace-nowrap rounded-full border border-verdict-stop px-2 text-sm font-semibold text-verdict-stop">
      Expired
    </span>
  );
}

const shownLots = 3;

/** The newest few lots; an expired one says so in words, not only in colour. */
export function LotWords({ lots }: { lots: Lot[] }) {
  if (lots.length === 0) return <span className="text-maple-700">No lots</span>;
  const more = lots.length - shownLots;
  return (
    <ul className="space-y-0.5 text-sm">
      {lots.slice(0, shownLots).map((lot) => (
        // The badge drops under the lot number when the column is narrow, rather than being cut off.
        <li key={lot.id} className="flex flex-wrap items-center gap-x-2 gap-y-0.5">
          <span className="whitespace-nowrap">{lot.lotNumber}</span>
          {lot.expired && <ExpiredBadge />}
        </li>
      ))}
      {more > 0 && <li className="text-maple-700">and {more} more</li>}
    </ul>
  );
}

export function DocumentLinks({ product }: { product: Product }) {
  return (
    <ul className="space-y-0.5 text-sm">
      {(['tds', 'sds'] as const).map((kind) => {
        const file = kind === 'tds' ? product.tdsFile : product.sdsFile;
        const title = documentTitles[kind];
        return (
          <li key={kind} className="whitespace-nowrap">
            {file ? (
              // The name starts with the words on screen, so voice control ("click TDS") finds the link.
              <a href={fileHref(file)} download className="font-semibold text-lacquer-800 underline underline-offset-2">
                {title.short} (PDF)<span className="sr-only">: download the {title.long} of {product.name}</span>
              </a>
            ) : (
              <span className="text-maple-700">No {title.short}</span>
            )}
          </li>
        );
      })}
    </ul>
  );
}
