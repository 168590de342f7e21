import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import type { PendingCoat } from '../hooks/use-pending-coats';
import { CoatCard } from './coat-card';
import { PendingCoats } from './pending-coats';

interface SessionCoatsProps {
  coats: { isPending: boolean; isError: boolean; error: unknown; data?: { items: Coat[] }; refetch: () => unknown };
  pending: PendingCoat[];
  onResend: () => void;
  onDiscard: (key: string) => void;
  partLabel: (id: number) => string;
  ready: Map<number, ReadyPart>;
  units: UnitSystem;
  timeZone: string;
}

/** The session's coats, newest first: the latest with all its times and the parts' next window. */
export function SessionCoats({ coats, pending, onResend, onDiscard, partLabel, ready, units, timeZone }: SessionCoatsProps) {
  return (
    <section aria-labelledby="coats-heading" className="space-y-3">
      <h2 id="coats-heading" className="text-xl font-bold">
        Coats in this session
      </h2>
      <PendingCoats pending={pending} timeZone={timeZone} onResend={onResend} onDiscard={onDiscard} />
      {coats.isPending ? (
        <LoadingState what="the coats" />
      ) : coats.isError || !coats.data ? (
        <ErrorState error={coats.error} what="the coats" onRetry={() => coats.refetch()} />
      ) : coats.data.items.length === 0 ? (
        pending.length === 0 && <EmptyState title="No coats recorded yet">Each coat appears here with its drying times as soon as it is recorded.</EmptyState>
      ) : (
        <div className="space-y-3">
          {coats.data.items.map((coat, index) => (
            <CoatCard key={coat.id} coat={coat} partLabel={partLabel} next={index === 0 ? ready.get(coat.partIds[0]) : undefined} latest={index === 0} units={units} timeZone={timeZone} />
          ))}
        </div>
      )}
    </section>
  );
}
