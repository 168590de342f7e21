import { useId } from 'react';
import { toast } from 'sonner';
import type { Booth } from '../../../../shared/schemas/booth';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/error-messages';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { useSendOrKeep } from '../hooks/use-send-or-keep';
import { newIdempotencyKey } from '../utils/idempotency';
import { useNow } from '../../../lib/use-now';
import { shopWhen } from '../utils/session-format';
import { Countdown } from './countdown';

interface ClearancePanelProps {
  session: SpraySession;
  booth: Booth;
  canRun: boolean;
  timeZone: string;
}

/** After spraying stops: the booth air takes its clearance time to fall to 1 %; protection stays on and others stay out till then. */
export function ClearancePanel({ session, booth, canRun, timeZone }: ClearancePanelProps) {
  const now = useNow();
  const update = useUpdateSpraySession();
  const sendOrKeep = useSendOrKeep(session.id);
  const reasonId = useId();
  const started = session.clearingStartedAt ?? session.updatedAt;
  const clearAt = new Date(Date.parse(started) + booth.clearanceMin * 60_000).toISOString();
  const clear = now.getTime() >= Date.parse(clearAt);

  const finish = async () => {
    const changes = { state: 'done' as const, changedAt: new Date().toISOString(), idempotencyKey: newIdempotencyKey() };
    try {
      const outcome = await sendOrKeep({ kind: 'session', spraySessionId: session.id, body: changes, label: 'Session done' }, () => update.mutateAsync({ id: session.id, changes }));
      toast.success(outcome.kind === 'saved' ? 'Session done. The coats stay in the coat log.' : 'Session done; kept on this tablet until the connection is back.');
    } catch (error) {
      toast.error(errorMessage(error));
    }
  };

  return (
    <section aria-labelledby="clearance-heading" className={`rounded-panel border-4 p-5 ${clear ? 'border-verdict-go bg-white' : 'border-verdict-caution bg-white'}`}>
      <h2 id="clearance-heading" className="text-2xl font-bold">
        {clear ? 'The air in the booth is clear' : 'Clearing the air'}
      </h2>
      {clear ? (
        <p className="mt-2 text-xl">
          Clear since {shopWhen(clearAt, timeZone, now)}. Protection may come off and others may come in; keep the parts where they are drying.
        </p>
      ) : (
        <>
          <p className="mt-3 flex flex-wrap items-center gap-4">
            <Countdown label="Clearance" until={clearAt} now={now} overText="the air is clear" large />
            <span className="text-xl font-semibold">until {shopWhen(clearAt, timeZone, now)}</span>
          </p>
          <p className="mt-3 text-xl font-semibold text-verdict-caution">
            <span aria-hidden="true">⚠ </span>Keep extraction running and your respiratory protection on. Keep everyone else out of {booth.name} until the countdown ends.
          </p>
        </>
      )}
      <p className="mt-2 text-maple-700">
        Clearance time {Math.ceil(booth.clearanceMin)} min ({booth.clearanceSource === 'measured' ? 'measured' : 'worked out from the booth’s volume and extraction'}), counted from {shopWhen(started, timeZone, now)} when spraying stopped.
      </p>
      {canRun && (
        <div className="mt-4">
          <Button className="min-h-14 px-8 text-lg" onClick={finish} disabled={!clear} pending={update.isPending} pendingText="Saving…" aria-describedby={clear ? undefined : reasonId}>
            Done
          </Button>
          {!clear && (
            <p id={reasonId} className="mt-1 text-maple-800">
              “Done” can be pressed once the air is clear.
            </p>
          )}
        </div>
      )}
    </section>
  );
}
