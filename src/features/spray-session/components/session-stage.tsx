import type { Booth } from '../../../../shared/schemas/booth';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useSessionDenibs, type useSessionCoats } from '../hooks/use-session-records';
import type { PendingWrite } from '../hooks/use-pending-writes';
import type { SessionPlan } from '../hooks/use-session-plan';
import { ChecklistSection } from './checklist-section';
import { ClearancePanel } from './clearance-panel';
import { CoatEntrySection } from './coat-entry-section';
import { DenibSection } from './denib-section';
import { MixesSection } from './mixes-section';
import { RecordedChecklist } from './recorded-checklist';
import { SessionCoats } from './session-coats';
import { StopSpraying } from './stop-spraying';

interface SessionStageProps {
  session: SpraySession;
  booth: Booth;
  plan: SessionPlan;
  coats: ReturnType<typeof useSessionCoats>;
  /** Writes of this session kept on the tablet, in the order made. */
  pending: PendingWrite[];
  /** The checks shown wait on the tablet: the server's verdict comes when they are sent. */
  checksWaiting: boolean;
  roles: { canRun: boolean; canRecord: boolean; canOverride: boolean };
  units: UnitSystem;
  timeZone: string;
}

/** What the session page shows at each step of the session: checks, spraying, clearing, done. */
export function SessionStage({ session, checksWaiting, booth, plan, coats, pending, roles, units, timeZone }: SessionStageProps) {
  const { state } = session;
  const denibs = useSessionDenibs(session.id);
  const labels = new Map(plan.parts.map((part) => [part.id, part.label]));
  // The planned coat's products first; the jobs' other coats follow, for a next coat sprayed in the same session.
  const mixProducts = [...plan.sprayed, ...[...plan.products.values()].filter((product) => !plan.sprayed.includes(product))];
  const coatsList = (
    <SessionCoats
      coats={coats}
      denibs={denibs.data?.items ?? []}
      waiting={pending.length}
      partLabel={(id) => labels.get(id) ?? `Part ${id}`}
      ready={plan.ready}
      units={units}
      timeZone={timeZone}
    />
  );
  const mixes = (
    <MixesSection
      sessionId={session.id}
      pending={pending}
      products={mixProducts}
      allProducts={plan.products}
      canRecord={roles.canRecord && (state === 'planned' || state === 'checking' || state === 'spraying')}
      airTempC={session.checklist?.airTempC ?? null}
      units={units}
      timeZone={timeZone}
    />
  );

  const denib = <DenibSection sessionId={session.id} plan={plan} canRecord={roles.canRecord} />;

  if (state === 'cancelled') return <p className="rounded-panel border-2 border-verdict-stop bg-white p-4 text-lg font-semibold">This session was cancelled. Nothing can be recorded on it.</p>;
  if (state === 'planned' || state === 'checking') {
    return (
      <>
        <ChecklistSection session={session} booth={booth} plan={plan} canRun={roles.canRun} canOverride={roles.canOverride} units={units} timeZone={timeZone} />
        {denib}
        {mixes}
      </>
    );
  }
  if (state === 'spraying') {
    return (
      <>
        {session.checklist && <RecordedChecklist checklist={session.checklist} waiting={checksWaiting} timeZone={timeZone} />}
        {denib}
        {roles.canRecord && (
          <CoatEntrySection session={session} plan={plan} sessionCoats={coats.data?.items ?? []} coatsPending={coats.isPending} pending={pending} units={units} timeZone={timeZone} />
        )}
        {coatsList}
        {mixes}
        {roles.canRun && <StopSpraying sessionId={session.id} booth={booth} />}
      </>
    );
  }
  return (
    <>
      {state === 'clearing' ? (
        <ClearancePanel session={session} booth={booth} canRun={roles.canRun} timeZone={timeZone} />
      ) : (
        <p className="rounded-panel border-2 border-verdict-go bg-white p-4 text-lg font-semibold">This session is done. Its coats are below and in the coat log.</p>
      )}
      {coatsList}
      {denib}
      {mixes}
    </>
  );
}
