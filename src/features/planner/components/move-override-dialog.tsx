import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { overrideSchema } from '../../../../shared/schemas/spray-session';
import { Dialog } from '../../../components/ui/dialog';
import { FormAlert } from '../../../components/ui/field';
import { errorMessage } from '../../../lib/error-messages';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { useUndoMove, type PendingMove } from '../hooks/use-calendar-moves';
import { sessionWhen } from '../utils/session-time';
import { OverrideReasonPanel } from './override-reason-panel';

interface MoveOverrideDialogProps {
  move: PendingMove | null;
  timeZone: string;
  onClose: () => void;
}

function MoveOverrideForm({ move, timeZone, onClose }: { move: PendingMove; timeZone: string; onClose: () => void }) {
  const updateSession = useUpdateSpraySession();
  const confirmMove = useUndoMove(timeZone);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm({ resolver: zodResolver(overrideSchema), defaultValues: { reason: '' } });
  const onSubmit = handleSubmit(async (override) => {
    setFormError(null);
    try {
      const saved = await updateSession.mutateAsync({ id: move.id, changes: { start: move.start, end: move.end, override } });
      confirmMove(saved, move.before);
      onClose();
    } catch (error) {
      setFormError(errorMessage(error));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <p>Move it to {sessionWhen(move, timeZone)}?</p>
      <OverrideReasonPanel
        message={move.message}
        registration={register('reason')}
        error={formState.errors.reason?.message}
        pending={updateSession.isPending}
        confirmLabel="Move anyway"
        backLabel="Leave it where it was"
        onBack={onClose}
      />
    </form>
  );
}

/** After a drag outside opening hours was refused: move it anyway with a recorded reason, or leave it. */
export function MoveOverrideDialog({ move, timeZone, onClose }: MoveOverrideDialogProps) {
  return (
    <Dialog open={move !== null} onClose={onClose} title="Outside opening hours">
      {move && <MoveOverrideForm move={move} timeZone={timeZone} onClose={onClose} />}
    </Dialog>
  );
}
