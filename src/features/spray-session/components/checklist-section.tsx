import type { Booth } from '../../../../shared/schemas/booth';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { useLatestReading } from '../../../api/readings/get-readings';
import { useSessionFitness } from '../../../api/spray-sessions/get-session-fitness';
import type { SessionPlan } from '../hooks/use-session-plan';
import { ChecklistForm } from './checklist-form';
import { RecordedChecklist } from './recorded-checklist';

interface ChecklistSectionProps {
  session: SpraySession;
  booth: Booth;
  plan: SessionPlan;
  canRun: boolean;
  canOverride: boolean;
  units: UnitSystem;
  timeZone: string;
}

/** Before spraying: the checks, the live verdict and the button that starts spraying. */
export function ChecklistSection({ session, booth, plan, canRun, canOverride, units, timeZone }: ChecklistSectionProps) {
  const reading = useLatestReading(booth.id);
  const fitness = useSessionFitness(session.id, canRun);
  return (
    <section aria-labelledby="checklist-heading" className="space-y-4 rounded-panel border border-maple-300 bg-white p-4">
      <div>
        <h2 id="checklist-heading" className="text-xl font-bold">
          Pre-spray checks
        </h2>
        <p className="text-maple-800">Every check must pass before spraying starts. The verdict updates as you go.</p>
      </div>
      {session.checklist && <RecordedChecklist checklist={session.checklist} timeZone={timeZone} />}
      {!canRun ? (
        !session.checklist && <p className="text-maple-800">The assigned sprayer records the checks here.</p>
      ) : reading.isPending ? (
        <LoadingState what="the latest booth reading" />
      ) : reading.isError ? (
        <ErrorState error={reading.error} what="the latest booth reading" onRetry={() => reading.refetch()} />
      ) : (
        <ChecklistForm session={session} booth={booth} products={plan.pending ? null : plan.sprayed} reading={reading.data} fitness={fitness.isError ? undefined : (fitness.data ?? null)} units={units} timeZone={timeZone} canOverride={canOverride} />
      )}
    </section>
  );
}
