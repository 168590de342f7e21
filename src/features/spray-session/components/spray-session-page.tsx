import type { Role } from '../../../../shared/permissions';
import { can } from '../../../../shared/permissions';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { useBooth } from '../../../api/booths/get-booth';
import { useSessionCoats } from '../hooks/use-session-records';
import { useSpraySession } from '../../../api/spray-sessions/get-spray-session';
import { usePendingWrites } from '../hooks/use-pending-writes';
import { withPendingWrites } from '../utils/pending-session';
import { useSessionPlan } from '../hooks/use-session-plan';
import { CautionsPanel } from './cautions-panel';
import { OfflineNote } from './offline-note';
import { PendingWrites } from './pending-writes';
import { SessionHeader } from './session-header';
import { SessionStage } from './session-stage';

export interface Viewer {
  id: number;
  role: Role;
}

interface PageProps {
  viewer: Viewer;
  units: UnitSystem;
  timeZone: string;
}

function LoadedSession({ session: saved, viewer, units, timeZone }: PageProps & { session: SpraySession }) {
  const pending = usePendingWrites(saved.id);
  // What waits on the tablet moves the session on (checks, start, stop) until the server's copy says so itself.
  const { session, checksWaiting } = withPendingWrites(saved, pending.pending);
  const booth = useBooth(session.boothId);
  const plan = useSessionPlan(session);
  const coats = useSessionCoats(session.id);
  const cautionsFirst = session.state === 'planned' || session.state === 'checking';
  const partCount = new Set(session.items.map((item) => item.partId)).size;
  const mayRun = can(viewer.role, 'spray-sessions:write') || (can(viewer.role, 'spray-sessions:run') && session.sprayerId === viewer.id);
  const roles = { canRun: mayRun, canRecord: mayRun && can(viewer.role, 'coats:write'), canOverride: can(viewer.role, 'spray-sessions:write') };

  return (
    <div className="mx-auto max-w-6xl">
      <SessionHeader session={session} timeZone={timeZone} partCount={partCount} />
      <OfflineNote waiting={pending.pending.filter((write) => write.problem === null)} timeZone={timeZone} />
      <div className="mb-4">
        <PendingWrites pending={pending.pending} timeZone={timeZone} onResend={() => void pending.resend()} onDiscard={pending.discard} />
      </div>
      {!mayRun && session.state !== 'done' && session.state !== 'cancelled' && (
        <p className="mb-4 rounded-panel border border-maple-400 bg-maple-100 p-3">
          You are looking at this session; {session.sprayerName ?? 'the assigned sprayer'} runs it. Ask the finishing lead to change the sprayer if it should be you.
        </p>
      )}
      {booth.isPending ? (
        <LoadingState what="the booth" />
      ) : booth.isError ? (
        <ErrorState error={booth.error} what="the booth" onRetry={() => booth.refetch()} />
      ) : (
        <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_22rem] xl:items-start">
          {/* Read before the checks; once spraying, the gloved hand needs the coat form first and the cautions follow it. */}
          <aside className={`xl:sticky xl:top-20 xl:order-2 ${cautionsFirst ? 'order-1' : 'order-2'}`}>
            <CautionsPanel products={plan.sprayed} booth={booth.data} gaps={plan.gaps} pending={plan.pending} />
          </aside>
          <div className={`min-w-0 space-y-6 xl:order-1 ${cautionsFirst ? 'order-2' : 'order-1'}`}>
            <SessionStage session={session} checksWaiting={checksWaiting} booth={booth.data} plan={plan} coats={coats} pending={pending.pending} roles={roles} units={units} timeZone={timeZone} />
          </div>
        </div>
      )}
    </div>
  );
}

export function SpraySessionPage({ sessionId, ...props }: PageProps & { sessionId: number }) {
  const session = useSpraySession(sessionId);
  if (session.isPending) return <LoadingState what="the spray session" />;
  if (session.isError) return <ErrorState error={session.error} what="the spray session" onRetry={() => session.refetch()} />;
  return <LoadedSession session={session.data} {...props} />;
}
