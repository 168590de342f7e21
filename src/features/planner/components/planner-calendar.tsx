import { useMemo, useState } from 'react';
import type { Booth } from '../../../../shared/schemas/booth';
import { calendarDateIn } from '../../../../shared/time';
import { Button } from '../../../components/ui/button';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { boothIdentities } from '../../../lib/booth-identity';
import { errorMessage } from '../../../lib/error-messages';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useSpraySessions } from '../../../api/spray-sessions/get-spray-sessions';
import { useCalendarMoves } from '../hooks/use-calendar-moves';
import { useNarrowScreen } from '../hooks/use-narrow-screen';
import { rangeTitle, stepDay, visibleRange, type PlannerView } from '../utils/calendar-range';
import type { PlanningSettings } from './booking-form';
import { MoveOverrideDialog } from './move-override-dialog';
import { PlannerBoard } from './planner-board';
import { PlannerToolbar, type BoothFilter } from './planner-toolbar';
import { SessionList } from './session-list';

interface PlannerCalendarProps {
  settings: PlanningSettings;
  booths: Booth[];
  /** An admin looking at one site; the sessions are that site's. */
  siteId?: number;
  canWrite: boolean;
  day: string;
  onDay: (day: string) => void;
  onBook: (start: string, end: string, boothId: number | null) => void;
  onOpen: (session: SpraySession) => void;
}

function Problem({ message, onDismiss }: { message: string; onDismiss: () => void }) {
  return (
    <div role="alert" className="mb-3 flex flex-wrap items-center justify-between gap-3 rounded-panel border-2 border-verdict-stop bg-white p-3 font-medium text-verdict-stop">
      <p>
        <span aria-hidden="true">⚠ </span>
        {message}
      </p>
      <Button variant="secondary" onClick={onDismiss}>
        Dismiss
      </Button>
    </div>
  );
}

/** What is on screen (week or day, which booths) and the calendar of it, with a list of the same sessions. */
export function PlannerCalendar({ settings, booths, siteId, canWrite, day, onDay, onBook, onOpen }: PlannerCalendarProps) {
  const timeZone = settings.timezone;
  const [chosenView, setView] = useState<PlannerView>('week');
  const [chosenBooth, setBoothFilter] = useState<BoothFilter>('all');
  // A booth chosen before the site changed is not among this site's booths: show them all.
  const boothFilter = booths.some((booth) => booth.id === chosenBooth) ? chosenBooth : 'all';
  const [showCancelled, setShowCancelled] = useState(false);
  const [interacting, setInteracting] = useState(false);
  const narrow = useNarrowScreen();
  const view = narrow ? 'day' : chosenView;
  const boothId = boothFilter === 'all' ? undefined : boothFilter;
  const sessions = useSpraySessions({ ...visibleRange(view, day, timeZone), boothId, siteId }, { enabled: !interacting });
  const moves = useCalendarMoves(timeZone);
  const title = rangeTitle(view, day);
  const shownBooths = boothId ? booths.filter((booth) => booth.id === boothId) : booths;
  const identities = useMemo(() => boothIdentities(booths.map((booth) => booth.id)), [booths]);
  // Kept stable across renders: a new list mid-drag would make the calendar redraw its events and drop the shading.
  const shownSessions = useMemo(() => (sessions.data?.items ?? []).filter((session) => showCancelled || session.state !== 'cancelled'), [sessions.data, showCancelled]);
  const open = (id: number) => {
    const session = sessions.data?.items.find((s) => s.id === id);
    if (session) onOpen(session);
  };

  return (
    <>
      <PlannerToolbar
        identities={identities}
        view={view}
        weekAllowed={!narrow}
        day={day}
        booths={booths}
        boothFilter={boothFilter}
        showCancelled={showCancelled}
        onView={setView}
        onStep={(direction) => onDay(stepDay(view, day, direction))}
        onToday={() => onDay(calendarDateIn(new Date(), timeZone))}
        onDay={onDay}
        onBoothFilter={setBoothFilter}
        onShowCancelled={setShowCancelled}
      />
      <div className="mb-2 flex flex-wrap items-baseline justify-between gap-x-4">
        <h2 className="text-xl font-semibold text-lacquer-900" aria-live="polite">
          {title}
        </h2>
        <p className="text-sm text-maple-700">
          Shaded: booth closed. Shop time ({timeZone}).{canWrite ? '' : ' You can look, not change.'}
        </p>
      </div>
      {moves.problem && <Problem message={moves.problem} onDismiss={moves.clearProblem} />}
      {sessions.isError && sessions.data && <Problem message={`Could not refresh the plan: ${errorMessage(sessions.error)}`} onDismiss={() => sessions.refetch()} />}
      {sessions.isPending ? (
        <LoadingState what="the spray sessions" />
      ) : sessions.isError && !sessions.data ? (
        <ErrorState error={sessions.error} what="the spray sessions" onRetry={() => sessions.refetch()} />
      ) : (
        <PlannerBoard
          view={view}
          day={day}
          title={title}
          timeZone={timeZone}
          booths={shownBooths}
          sessions={shownSessions}
          canWrite={canWrite}
          identities={identities}
          onSelectRange={(start, end, boothForRange) => onBook(start.toISOString(), end.toISOString(), boothForRange)}
          onOpenSession={open}
          onMove={moves.onMove}
          onInteracting={setInteracting}
        />
      )}
      <SessionList sessions={shownSessions} timeZone={timeZone} title={title} identities={identities} onOpen={open} />
      {canWrite && <MoveOverrideDialog move={moves.pendingMove} timeZone={timeZone} onClose={moves.closePendingMove} />}
    </>
  );
}
