import { useState } from 'react';
import { toast } from 'sonner';
import { errorMessage } from '../../../lib/error-messages';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import type { SessionMoveArg } from '../components/booth-calendar';
import { needsOverrideReason } from '../utils/booking-errors';
import { sessionWhen } from '../utils/session-time';

export interface PendingMove {
  id: number;
  start: string;
  end: string;
  message: string;
  /** Where it was, so the move can be undone. */
  before: SpraySession;
}

/**
 * Undo puts a moved session back where it was. A slot first booked outside opening hours goes
 * back with the reason it was booked there under.
 */
export function useUndoMove(timeZone: string) {
  const updateSession = useUpdateSpraySession();
  const undo = (before: SpraySession) =>
    updateSession
      .mutateAsync({ id: before.id, changes: { start: before.start, end: before.end, boothId: before.boothId, ...(before.overrideReason ? { override: { reason: before.overrideReason } } : {}) } })
      .then(
        () => toast.success(`Put back: ${before.boothName}, ${sessionWhen(before, timeZone)}.`),
        (error: unknown) => toast.error(`Could not undo: ${errorMessage(error)}`),
      );
  return (saved: SpraySession, before: SpraySession) =>
    toast.success(`Moved: ${saved.boothName}, ${sessionWhen(saved, timeZone)}.`, { duration: 10_000, action: { label: 'Undo', onClick: () => void undo(before) } });
}

/**
 * A drag or resize is saved at once, with Undo on the confirmation. When the server refuses, the
 * block goes back where it was and the reason is shown in words; outside opening hours the lead
 * may give a reason and move it anyway.
 */
export function useCalendarMoves(timeZone: string) {
  const updateSession = useUpdateSpraySession();
  const confirmMove = useUndoMove(timeZone);
  const [problem, setProblem] = useState<string | null>(null);
  const [pendingMove, setPendingMove] = useState<PendingMove | null>(null);

  const onMove = (arg: SessionMoveArg) => {
    const { event } = arg;
    const before = event.extendedProps.session as SpraySession;
    if (!event.start || !event.end) return arg.revert();
    const move = { id: Number(event.id), start: event.start.toISOString(), end: event.end.toISOString() };
    setProblem(null);
    updateSession.mutateAsync({ id: move.id, changes: { start: move.start, end: move.end } }).then(
      (saved) => confirmMove(saved, before),
      (error: unknown) => {
        arg.revert();
        if (needsOverrideReason(error)) setPendingMove({ ...move, message: errorMessage(error), before });
        else setProblem(`Not moved: ${errorMessage(error)}`);
      },
    );
  };

  return { onMove, problem, clearProblem: () => setProblem(null), pendingMove, closePendingMove: () => setPendingMove(null) };
}
