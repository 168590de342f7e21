import { useState } from 'react';
import { toast } from 'sonner';
import { errorMessage } from '../../../lib/error-messages';
import { useUpdateSpraySession } from '../api/update-spray-session';
import type { SessionMoveArg } from '../components/booth-calendar';
import { needsOverrideReason } from '../utils/booking-errors';
import { sessionWhen } from '../utils/session-time';

export interface PendingMove {
  id: number;
  start: string;
  end: string;
  message: string;
}

/**
 * A drag or resize is saved at once. When the server refuses, the block goes back where it was
 * and the reason is shown in words; outside opening hours the lead may give a reason and move it anyway.
 */
export function useCalendarMoves(timeZone: string) {
  const updateSession = useUpdateSpraySession();
  const [problem, setProblem] = useState<string | null>(null);
  const [pendingMove, setPendingMove] = useState<PendingMove | null>(null);

  const onMove = (arg: SessionMoveArg) => {
    const { event } = arg;
    if (!event.start || !event.end) return arg.revert();
    const move = { id: Number(event.id), start: event.start.toISOString(), end: event.end.toISOString() };
    setProblem(null);
    updateSession.mutateAsync({ id: move.id, changes: { start: move.start, end: move.end } }).then(
      (saved) => toast.success(`Moved: ${saved.boothName}, ${sessionWhen(saved, timeZone)}.`),
      (error: unknown) => {
        arg.revert();
        if (needsOverrideReason(error)) setPendingMove({ ...move, message: errorMessage(error) });
        else setProblem(`Not moved: ${errorMessage(error)}`);
      },
    );
  };

  return { onMove, problem, clearProblem: () => setProblem(null), pendingMove, closePendingMove: () => setPendingMove(null) };
}
