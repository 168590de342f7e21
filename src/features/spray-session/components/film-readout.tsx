import { filmVerdict, wetFilmTargetUm } from '../../../../shared/finishing/film';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import { formatQuantity } from '../../../../shared/units';
import { VerdictBadge } from './verdict-badge';

interface FilmReadoutProps {
  product: Product;
  targetDryUm: number | null;
  dryFilmUm: number | null;
  thinningPct: number;
  units: UnitSystem;
}

const filmWords = { thin: 'Thin', 'on-target': 'On target', heavy: 'Heavy' } as const;

function aimFor(product: Product, target: number, thinningPct: number, units: UnitSystem): string | null {
  try {
    return formatQuantity(wetFilmTargetUm({ dryFilmUm: target, volumeSolidsPct: product.volumeSolidsPct, thinningPct }), 'filmThickness', units);
  } catch {
    return null;
  }
}

/** Dry film from the comb reading, against the step's target, in words as well as colour. */
export function FilmReadout({ product, targetDryUm, dryFilmUm, thinningPct, units }: FilmReadoutProps) {
  const target = targetDryUm ?? product.dryFilmPerCoatUm;
  const film = (um: number) => formatQuantity(um, 'filmThickness', units);
  const verdict = dryFilmUm !== null && target !== null ? filmVerdict(dryFilmUm, target) : null;
  const aim = target !== null ? aimFor(product, target, thinningPct, units) : null;
  return (
    <div aria-live="polite" className="rounded-panel border-2 border-lacquer-600 bg-white p-3">
      {dryFilmUm === null ? (
        <p className="text-lg">Enter the wet film reading to see the dry film.</p>
      ) : (
        <p className="flex flex-wrap items-center gap-3 text-lg">
          <span>
            Dry film <strong className="text-2xl">{film(dryFilmUm)}</strong>
            {target !== null && <> against a target of {film(target)}</>}
          </span>
          {verdict && <VerdictBadge verdict={verdict === 'on-target' ? 'go' : 'caution'} label={filmWords[verdict]} />}
        </p>
      )}
      {aim && (
        <p className="mt-1 text-maple-700">
          For {film(target!)} dry at this thinning, aim for about {aim} wet ({product.volumeSolidsPct} % volume solids).
        </p>
      )}
    </div>
  );
}
