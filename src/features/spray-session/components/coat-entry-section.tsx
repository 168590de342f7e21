import type { Coat } from '../../../../shared/schemas/coat';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { LoadingState } from '../../../components/ui/states';
import { useLatestReading } from '../../../api/readings/get-readings';
import { useMixes } from '../../../api/mixes/get-mixes';
import type { PendingWrite } from '../hooks/use-pending-writes';
import { pendingMixes } from '../utils/pending-session';
import type { SessionPlan } from '../hooks/use-session-plan';
import { fromPart } from '../utils/picked-part';
import { partsDueNow } from '../utils/session-plan';
import { CoatForm } from './coat-form';

interface CoatEntrySectionProps {
  session: SpraySession;
  plan: SessionPlan;
  sessionCoats: Coat[];
  /** The session's coats are still loading: the parts due cannot be told yet. */
  coatsPending: boolean;
  /** The session's writes kept on the tablet: a pot mixed offline can be this coat's mix. */
  pending: PendingWrite[];
  units: UnitSystem;
  timeZone: string;
}

function progressWords(ready: ReadyPart): string {
  const done = `${ready.coatsDone} of ${ready.coatsTotal} coats done`;
  return ready.abradeRequired ? `${done} · denib needed` : done;
}

/** The coat form waits for the plan, the parts' readiness and the session's coats, so it starts from the parts due now. */
export function CoatEntrySection({ session, plan, sessionCoats, coatsPending, pending, units, timeZone }: CoatEntrySectionProps) {
  const reading = useLatestReading(session.boothId);
  const mixes = useMixes(session.id);
  const planned = plan.parts.map((part) => {
    const ready = plan.ready.get(part.id);
    return { ...fromPart(part), progress: ready ? progressWords(ready) : undefined };
  });
  const loading = plan.pending || plan.readyPending || coatsPending || (reading.isPending && !session.checklist) || mixes.isPending;
  return (
    <section aria-labelledby="coat-heading" className="space-y-4 rounded-panel border-2 border-lacquer-700 bg-white p-4">
      <h2 id="coat-heading" className="text-xl font-bold">
        Record a coat
      </h2>
      {loading ? (
        <LoadingState what="the parts, steps and mixes" />
      ) : (
        <CoatForm
          session={session}
          plan={plan}
          planned={planned}
          due={partsDueNow(session, plan.parts, plan, sessionCoats)}
          mixes={[...pendingMixes(pending, plan.products), ...(mixes.data ?? [])]}
          sessionCoats={sessionCoats}
          reading={reading.data ?? null}
          units={units}
          timeZone={timeZone}
        />
      )}
    </section>
  );
}
