import { toast } from 'sonner';
import { errorMessage } from '../../../lib/error-messages';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { sessionWhen } from '../utils/session-time';

/**
 * Cancelling keeps the session on record (state "cancelled") and offers Undo, which puts it back
 * as planned; the server checks the slot is still free before it does.
 */
export function useCancelSession(timeZone: string) {
  const updateSession = useUpdateSpraySession();

  const restore = (session: SpraySession) =>
    updateSession.mutateAsync({ id: session.id, changes: { state: 'planned' } }).then(
      () => toast.success(`Back in the plan: ${session.boothName}, ${sessionWhen(session, timeZone)}.`),
      (error: unknown) => toast.error(`Could not undo: ${errorMessage(error)}`),
    );

  return (session: SpraySession) =>
    updateSession.mutateAsync({ id: session.id, changes: { state: 'cancelled' } }).then(
      () =>
        toast.success(`Cancelled: ${session.boothName}, ${sessionWhen(session, timeZone)}.`, {
          duration: 10_000,
          action: { label: 'Undo', onClick: () => void restore(session) },
        }),
      (error: unknown) => toast.error(`Not cancelled: ${errorMessage(error)}`),
    );
}
