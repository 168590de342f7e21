import { useState } from 'react';
import { toast } from 'sonner';
import type { Booth } from '../../../../shared/schemas/booth';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { errorMessage } from '../../../lib/error-messages';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';

/** One big button for the end of spraying; the clearance countdown starts from the moment it is confirmed. */
export function StopSpraying({ sessionId, booth }: { sessionId: number; booth: Booth }) {
  const update = useUpdateSpraySession();
  const [asking, setAsking] = useState(false);
  const stop = async () => {
    try {
      await update.mutateAsync({ id: sessionId, changes: { state: 'clearing' } });
      setAsking(false);
      toast.success('Spraying stopped. The clearance countdown has started.');
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
