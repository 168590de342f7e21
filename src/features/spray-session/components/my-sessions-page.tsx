import { useState } from 'react';
import { Link } from 'react-router-dom';
import { calendarDateIn } from '../../../../shared/time';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { sessionWorkLine } from '../../../lib/session-work-words';
import { formatShopDate } from '../../../lib/shop-time';
import { useSpraySessions } from '../../../api/spray-sessions/get-spray-sessions';
import { sessionSpan } from '../utils/session-format';
import { SessionStateBadge } from './session-header';
import { SessionsWarmup } from './session-warmup';

const hourMs = 3_600_000;

/** From a day back (so all of today is in, whatever the zone) to a week ahead; fixed once per visit so the key stays put. */
function rangeFromNow() {
  const now = Date.now();
  return { from: new Date(now - 24 * hourMs).toISOString(), to: new Date(now + 8 * 24 * hourMs).toISOString() };
}

interface MySessionsPageProps {
  viewerId: number;
  /** A lead sees every booth's sessions; a sprayer sees the ones assigned to them. */
  seesAll: boolean;
  timeZone: string;
}

function SessionRow({ session, timeZone }: { session: SpraySession; timeZone: string }) {
  return (
    <li>
      <Link
        to={`/spray-sessions/${session.id}`}
        className="flex min-h-16 flex-wrap items-center justify-between gap-3 rounded-panel border-2 border-maple-300 bg-white p-4 hover:border-lacquer-600 hover:bg-lacquer-50"
      >
        <span>
          <span className="block text-lg font-bold text-lacquer-900 underline-offset-4">{session.boothName}</span>
          <span className="block text-maple-800">
            {sessionSpan(session, timeZone)} · {session.sprayerName ?? 'no sprayer yet'}
          </span>
          <span className="block text-maple-800">{sessionWorkLine(session.work)}</span>
        </span>
        <SessionStateBadge state={session.state} />
      </Link>
    </li>
  );
}

export function MySessionsPage({ viewerId, seesAll, timeZone }: MySessionsPageProps) {
  const [range] = useState(rangeFromNow);
  const sessions = useSpraySessions(range);
  const today = calendarDateIn(new Date(), timeZone);
  const relevant = (sessions.data?.items ?? []).filter((s) => (seesAll || s.sprayerId === viewerId) && calendarDateIn(new Date(s.end), timeZone) >= today);
  // Cancelled bookings would bury the ones to run; they are counted, not listed.
  const mine = relevant.filter((s) => s.state !== 'cancelled');
  const cancelled = relevant.length - mine.length;
  // A session still running from yesterday counts as today's.
  const dayOf = (s: SpraySession) => [calendarDateIn(new Date(s.start), timeZone), today].sort()[1];
  const days = [...new Set(mine.map(dayOf))].sort();
  // Only the viewer's own sessions of today: a lead's whole week would be a lot of reading for nothing.
  const todays = mine.filter((s) => s.sprayerId === viewerId && dayOf(s) === today);

  return (
    <>
      <SessionsWarmup sessions={todays} />
      <PageHeader
        title={seesAll ? 'Spray sessions' : 'My spray sessions'}
        description={seesAll ? 'Every booth’s sessions today and in the week ahead.' : 'The sessions you are booked to spray, today and in the week ahead. Open one to do its checks and record its coats.'}
      />
      {sessions.isPending ? (
        <LoadingState what="the sessions" />
      ) : sessions.isError ? (
        <ErrorState error={sessions.error} what="the sessions" onRetry={() => sessions.refetch()} />
      ) : mine.length === 0 ? (
        <EmptyState title="No sessions booked">{seesAll ? 'Book sessions in the booth planner.' : 'Nothing is booked for you this week. The finishing lead books sessions in the booth planner.'}</EmptyState>
      ) : (
        <div className="space-y-6">
          {cancelled > 0 && <p className="text-maple-700">{cancelled === 1 ? '1 cancelled session is' : `${cancelled} cancelled sessions are`} not shown.</p>}
          {days.map((day) => (
            <section key={day} aria-labelledby={`day-${day}`}>
              <h2 id={`day-${day}`} className="mb-2 text-xl font-semibold">
                {day === today ? 'Today' : formatShopDate(new Date(`${day}T12:00:00Z`), 'UTC')}
              </h2>
              <ul className="space-y-2">
                {mine
                  .filter((s) => dayOf(s) === day)
                  .map((session) => (
                    <SessionRow key={session.id} session={session} timeZone={timeZone} />
                  ))}
              </ul>
            </section>
          ))}
        </div>
      )}
    </>
  );
}
