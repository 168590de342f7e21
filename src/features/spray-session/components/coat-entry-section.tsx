import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { LoadingState } from '../../../components/ui/states';
import { useLatestReading } from '../api/get-latest-reading';
import { useMixes } from '../api/get-mixes';
import type { PendingCoat } from '../hooks/use-pending-coats';
import type { SessionPlan } from '../hooks/use-session-plan';
import { fromPart } from '../utils/picked-part';
import { CoatForm } from './coat-form';

interface CoatEntrySectionProps {
  session: SpraySession;
  plan: SessionPlan;
  sessionCoats: Coat[];
  queue: (body: PendingCoat['body'], label: string) => void;
  units: UnitSystem;
  timeZone: string;
}

/** The coat form waits for the plan, so it starts from the planned parts and their step. */
export function CoatEntrySection({ session, plan, sessionCoats, queue, units, timeZone }: CoatEntrySectionProps) {
  const reading = useLatestReading(session.boothId);
  const mixes = useMixes(session.id);
  const planned = plan.parts.map((part) => {
    const ready = plan.ready.get(part.id);
    return { ...fromPart(part), progress: ready ? `${ready.coatsDone} of ${ready.coatsTotal} coats done` : undefined };
  });
  return (
    <section aria-labelledby="coat-heading" className="space-y-4 rounded-panel border-2 border-lacquer-700 bg-white p-4">
      <h2 id="coat-heading" className="text-xl font-bold">
        Record a coat
      </h2>
      {plan.pending || (reading.isPending && !session.checklist) || mixes.isPending ? (
        <LoadingState what="the parts, steps and mixes" />
      ) : (
        <CoatForm
          session={session}
          plan={plan}
          planned={planned}
          mixes={mixes.data ?? []}
          sessionCoats={sessionCoats}
          reading={reading.data ?? null}
          queue={queue}
          units={units}
          timeZone={timeZone}
        />
      )}
    </section>
  );
}
