import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import { Button } from '../../../components/ui/button';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useMixes } from '../../../api/mixes/get-mixes';
import { useNow } from '../../../lib/use-now';
import type { PendingWrite } from '../hooks/use-pending-writes';
import { pendingMixes } from '../utils/pending-session';
import { MixCard } from './mix-card';
import { MixForm } from './mix-form';

interface MixesSectionProps {
  sessionId: number;
  /** The session's writes kept on the tablet: pots mixed offline show first, waiting to send. */
  pending: PendingWrite[];
  /** Products the mix form offers: the session's planned ones first, then the other coats of its jobs' finish systems. */
  products: Product[];
  allProducts: Map<number, Product>;
  canRecord: boolean;
  airTempC: number | null;
  units: UnitSystem;
  timeZone: string;
}

export function MixesSection({ sessionId, pending, products, allProducts, canRecord, airTempC, units, timeZone }: MixesSectionProps) {
  const mixes = useMixes(sessionId);
  const kept = pendingMixes(pending, allProducts);
  const now = useNow();
  const [adding, setAdding] = useState(false);
  return (
    <section aria-labelledby="mixes-heading" className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="mixes-heading" className="text-xl font-bold">
          Mixes
        </h2>
        {canRecord && !adding && (
          <Button variant="secondary" className="min-h-14" onClick={() => setAdding(true)} disabled={products.length === 0}>
            Record a mix
          </Button>
        )}
      </div>
      {adding && <MixForm sessionId={sessionId} products={products} airTempC={airTempC} units={units} onDone={() => setAdding(false)} />}
      {kept.length > 0 && (
        <div className="grid gap-3 xl:grid-cols-2">
          {kept.map((mix) => (
            <MixCard key={mix.id} mix={mix} product={allProducts.get(mix.productId)} now={now} timeZone={timeZone} units={units} />
          ))}
        </div>
      )}
      {mixes.isPending ? (
        <LoadingState what="the mixes" />
      ) : mixes.isError ? (
        <ErrorState error={mixes.error} what="the mixes" onRetry={() => mixes.refetch()} />
      ) : mixes.data.length === 0 ? (
        kept.length === 0 && !adding && <EmptyState title="No mixes yet">{canRecord ? 'Record each pot as you mix it: its pot life counts down here.' : 'The sprayer records each pot here.'}</EmptyState>
      ) : (
        <div className="grid gap-3 xl:grid-cols-2">
          {mixes.data.map((mix) => (
            <MixCard key={mix.id} mix={mix} product={allProducts.get(mix.productId)} now={now} timeZone={timeZone} units={units} />
          ))}
        </div>
      )}
    </section>
  );
}
