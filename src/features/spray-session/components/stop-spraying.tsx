import { useState } from 'react';
import { toast } from 'sonner';
import type { Booth } from '../../../../shared/schemas/booth';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { errorMessage } from '../../../lib/error-messages';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { useSendOrKeep } from '../hooks/use-send-or-keep';
import { newIdempotencyKey } from '../utils/idempotency';

/** One big button for the end of spraying; the clearance countdown starts from the moment it is confirmed. */
export function StopSpraying({ sessionId, booth }: { sessionId: number; booth: Booth }) {
  const update = useUpdateSpraySession();
  const sendOrKeep = useSendOrKeep(sessionId);
  const [asking, setAsking] = useState(false);
  const stop = async () => {
    const changes = { state: 'clearing' as const, changedAt: new Date().toISOString(), idempotencyKey: newIdempotencyKey() };
    try {
      const outcome = await sendOrKeep({ kind: 'session', spraySessionId: sessionId, body: changes, label: 'Spraying stopped' }, () => update.mutateAsync({ id: sessionId, changes }));
      setAsking(false);
      toast.success(outcome.kind === 'saved' ? 'Spraying stopped. The clearance countdown has started.' : 'Spraying stopped. The clearance countdown has started; the stop is kept on this tablet until the connection is back.');
    } catch (error) {
      toast.error(errorMessage(error));
    }
  };
  return (
    <>
      <Button variant="danger" className="min-h-16 w-full text-xl" onClick={() => setAsking(true)}>
        Spraying stopped
      </Button>
      <ConfirmDialog
        open={asking}
        title="Has spraying stopped?"
        message={`The clearance countdown (${Math.ceil(booth.clearanceMin)} min for ${booth.name}) starts now. Record any coat still to be recorded first; coats can be added later too.`}
        confirmLabel="Yes, spraying has stopped"
        variant="danger"
        pending={update.isPending}
        onConfirm={stop}
        onCancel={() => setAsking(false)}
      />
    </>
  );
}
