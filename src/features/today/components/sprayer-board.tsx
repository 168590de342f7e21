import { Link } from 'react-router-dom';
import type { SprayerBoard as SprayerBoardData, TodaySession } from '../../../../shared/schemas/today';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/states';
import { coatHeadline, coatMaterial, partsWords } from '../../../lib/session-work-words';
import { formatShopDate, formatShopDateTime } from '../../../lib/shop-time';
import { nextStepWords, sessionHours, StateChip } from './session-words';

const finished = (s: TodaySession) => s.nextStep.kind === 'done';

/** When the coat may go on, from the previous coat's recoat window. */
function windowWords(window: NonNullable<TodaySession['work']['recoatWindow']>, timeZone: string): string {
  const opens = `Recoat window opens ${formatShopDateTime(window.opensAt, timeZone)}`;
  return window.closesAt ? `${opens}, closes ${formatShopDateTime(window.closesAt, timeZone)}` : `${opens}, no closing time`;
}

function MySession({ session, timeZone }: { session: TodaySession; timeZone: string }) {
  return (
    <li className={`rounded-panel border-2 bg-white p-4 shadow-sm ${finished(session) ? 'border-maple-300' : 'border-lacquer-600'}`}>
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-2xl font-bold tabular-nums text-lacquer-900">{sessionHours(session, timeZone)}</p>
        <p className="text-lg font-semibold">{session.boothName}</p>
        <StateChip state={session.state} />
      </div>
      <ul className="mt-2 space-y-0.5">
        {session.work.coats.map((coat) => (
          <li key={`${coat.jobId}-${coat.stepPosition}`}>
            <span className="font-semibold">{coatHeadline(coat)}</span>: {coatMaterial(coat)}
          </li>
        ))}
        <li className="text-maple-800">{partsWords(session.work)}</li>
        {session.work.recoatWindow && <li className="text-maple-800">{windowWords(session.work.recoatWindow, timeZone)}</li>}
      </ul>
      <div className="mt-3 flex flex-wrap items-center justify-between gap-3 rounded-panel bg-lacquer-50 px-3 py-2">
        <p className="text-lg">
          <span className="font-semibold">Next: </span>
          {nextStepWords(session.nextStep, timeZone)}
        </p>
        <Link to={`/spray-sessions/${session.id}`} className={buttonClasses(finished(session) ? 'secondary' : 'primary')}>
          Open the session
        </Link>
      </div>
    </li>
  );
}

/** A sprayer's day: their sessions, each with the one thing to do next in it. */
export function SprayerBoard({ board, timeZone }: { board: SprayerBoardData; timeZone: string }) {
  const next = board.nextSession;
  return (
    <div className="space-y-6">
      <section aria-labelledby="today-mine" className="space-y-3">
        <h2 id="today-mine" className="text-xl font-semibold text-lacquer-900">
          My sessions today
        </h2>
        {board.mySessions.length === 0 ? (
          <EmptyState title="Nothing booked for you today">
            {next ? (
              <>
                Your next session:{' '}
                <Link to={`/spray-sessions/${next.id}`} className="font-semibold text-lacquer-800 underline underline-offset-4">
                  {formatShopDate(new Date(`${next.date}T12:00:00Z`), 'UTC')}, {sessionHours(next, timeZone)} in {next.boothName}
                </Link>
                .
              </>
            ) : (
              'No sessions are booked for you yet. The finishing lead books them in the booth planner.'
            )}
          </EmptyState>
        ) : (
          <ul className="space-y-3">
            {board.mySessions.map((session) => (
              <MySession key={session.id} session={session} timeZone={timeZone} />
            ))}
          </ul>
        )}
      </section>
      {board.unassignedToday > 0 && (
        <p className="rounded-panel border border-verdict-caution bg-white p-3">
          {board.unassignedToday === 1 ? '1 session later today has' : `${board.unassignedToday} sessions later today have`} no sprayer yet. Ask the finishing lead if you can take {board.unassignedToday === 1 ? 'it' : 'one'}.
        </p>
      )}
      <p>
        <Link to="/spray-sessions" className="font-medium text-lacquer-800 underline underline-offset-4">
          All my sessions this week
        </Link>
      </p>
    </div>
  );
}
