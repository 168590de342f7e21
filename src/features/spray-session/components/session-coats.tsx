import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Denib } from '../../../../shared/schemas/denib';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { CoatCard } from './coat-card';
import { DenibCard } from './denib-card';

interface SessionCoatsProps {
  coats: { isPending: boolean; isError: boolean; error: unknown; data?: { items: Coat[] }; refetch: () => unknown };
  /** The session's denibs, shown in time order among the coats. */
  denibs: Denib[];
  /** Writes of this session kept on the tablet (listed at the top of the page): the list is not empty then. */
  waiting: number;
  partLabel: (id: number) => string;
  ready: Map<number, ReadyPart>;
  units: UnitSystem;
  timeZone: string;
}

/** The session's coats, newest first: the latest with all its times and the parts' next window. */
type Entry = { kind: 'coat'; at: string; coat: Coat } | { kind: 'denib'; at: string; denib: Denib };

/** Coats and denibs together, newest first. */
function timeline(coats: Coat[], denibs: Denib[]): Entry[] {
  const entries: Entry[] = [...coats.map((coat) => ({ kind: 'coat' as const, at: coat.sprayedAt, coat })), ...denibs.map((denib) => ({ kind: 'denib' as const, at: denib.abradedAt, denib }))];
  return entries.sort((a, b) => Date.parse(b.at) - Date.parse(a.at));
}

export function SessionCoats({ coats, denibs, waiting, partLabel, ready, units, timeZone }: SessionCoatsProps) {
  return (
    <section aria-labelledby="coats-heading" className="space-y-3">
      <h2 id="coats-heading" className="text-xl font-bold">
        Coats and denibs in this session
      </h2>
      {coats.isPending ? (
        <LoadingState what="the coats" />
      ) : coats.isError || !coats.data ? (
        <ErrorState error={coats.error} what="the coats" onRetry={() => coats.refetch()} />
      ) : coats.data.items.length === 0 && denibs.length === 0 ? (
        waiting === 0 && <EmptyState title="No coats recorded yet">Each coat appears here with its drying times as soon as it is recorded, and each denib between them.</EmptyState>
      ) : (
        <div className="space-y-3">
          {timeline(coats.data.items, denibs).map((entry) => {
            if (entry.kind === 'denib') return <DenibCard key={`denib-${entry.denib.id}`} denib={entry.denib} partLabel={partLabel} timeZone={timeZone} />;
            const latest = entry.coat.id === coats.data?.items[0]?.id;
            return <CoatCard key={entry.coat.id} coat={entry.coat} partLabel={partLabel} next={latest ? ready.get(entry.coat.partIds[0]) : undefined} latest={latest} units={units} timeZone={timeZone} />;
          })}
        </div>
      )}
    </section>
  );
}
