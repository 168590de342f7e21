import { mixQuantities } from '../../../../shared/finishing/material';
import { mixTimes, potLifeReferenceTempC } from '../../../../shared/finishing/pot-life';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import { formatQuantity } from '../../../../shared/units';
import { formatMinutes } from '../../../lib/durations';

interface MixPreviewProps {
  product: Product;
  wantedL: number | null | undefined;
  thinningPct: number | null | undefined;
  tempC: number | null | undefined;
  units: UnitSystem;
}

function potLifeWords(product: Product, tempC: number | null | undefined): string | null {
  if (!product.potLifeMin || typeof tempC !== 'number') return null;
  try {
    const mixedAt = new Date(0);
    const times = mixTimes({ mixedAt, inductionMin: product.inductionMin, potLifeMin: product.potLifeMin, refTempC: potLifeReferenceTempC(product.dryingTimes), tempC });
    const induction = product.inductionMin > 0 ? `stand ${formatMinutes(times.inductionEndsAt.getTime() / 60_000)}, then ` : '';
    return `At this temperature: ${induction}use within about ${formatMinutes(times.potLifeEndsAt.getTime() / 60_000)}.`;
  } catch {
    return null;
  }
}

/** What to pour, worked out as the numbers are typed; the server records the same sums. */
export function MixPreview({ product, wantedL, thinningPct, tempC, units }: MixPreviewProps) {
  const ratio = { base: product.mixBaseParts, hardener: product.mixHardenerParts };
  let quantities = null;
  try {
    if (typeof wantedL === 'number') quantities = mixQuantities({ wantedL, ratio, thinningPct: thinningPct ?? 0, thinnerBasis: 'on-mix' });
  } catch {
    quantities = null;
  }
  const litres = (l: number) => formatQuantity(l, 'liquidVolume', units);
  return (
    <div aria-live="polite" className="rounded-panel border-2 border-lacquer-600 bg-white p-3">
      <p className="font-semibold">
        Ratio {ratio.base} : {ratio.hardener} by volume{ratio.hardener === 0 ? ' (one-pack)' : ''}, thinner as % of base + hardener
      </p>
      {quantities ? (
        <p className="mt-1 text-lg">
          Pour <strong>{litres(quantities.baseL)}</strong> base, <strong>{litres(quantities.hardenerL)}</strong> hardener and <strong>{litres(quantities.thinnerL)}</strong> thinner: {litres(quantities.totalL)} in all.
        </p>
      ) : (
        <p className="mt-1 text-maple-700">Enter the amount to see what to pour.</p>
      )}
      {potLifeWords(product, tempC) && <p className="mt-1">{potLifeWords(product, tempC)}</p>}
    </div>
  );
}
