import { Link } from 'react-router-dom';
import type { LeadBoard, TodaySession } from '../../../../shared/schemas/today';
import { BoothMark } from '../../../components/ui/booth-mark';
import type { BoothIdentity } from '../../../lib/booth-identity';
import { sessionWorkLine } from '../../../lib/session-work-words';
import { formatShopDate } from '../../../lib/shop-time';
import { AssignSprayerSelect } from './assign-sprayer-select';
import { sessionHours, StateChip } from './session-words';

interface BoothDayCardProps {
  booth: LeadBoard['booths'][number];
  identity: BoothIdentity | undefined;
  days: { date: string; label: string; sessions: TodaySession[] }[];
  sprayers: LeadBoard['sprayers'];
  timeZone: string;
}

function SessionRow({ session, sprayers, timeZone }: { session: TodaySession; sprayers: LeadBoard['sprayers']; timeZone: string }) {
  const assignable = session.state === 'planned' || session.state === 'checking';
  return (
    <li className="space-y-1 border-t border-maple-200 py-2 first:border-t-0">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <Link to={`/spray-sessions/${session.id}`} className="font-semibold text-lacquer-800 tabular-nums underline underline-offset-4">
          {sessionHours(session, timeZone)}
        </Link>
        <StateChip state={session.state} />
        {!session.sprayerName && <span className="rounded-full bg-verdict-caution px-2 py-0.5 text-sm font-bold text-white">No sprayer yet</span>}
      </div>
      <p className="text-sm text-maple-800">{sessionWorkLine(session.work)}</p>
      {assignable ? (
        <AssignSprayerSelect session={session} sprayers={sprayers} label={`${session.boothName}, ${sessionHours(session, timeZone)}`} />
      ) : (
        <p className="text-sm">Sprayer: {session.sprayerName ?? 'nobody'}</p>
      )}
    </li>
  );
}

/** One booth's sessions today and tomorrow, each with its sprayer (given on the spot when missing). */
export function BoothDayCard({ booth, identity, days, sprayers, timeZone }: BoothDayCardProps) {
  const ofSite = sprayers.filter((s) => s.siteId === booth.siteId);
  return (
    <section aria-labelledby={`today-booth-${booth.id}`} className="rounded-panel border border-maple-300 bg-white shadow-sm" style={{ borderLeft: `6px solid ${identity?.ink ?? '#95805c'}` }}>
      <h3 id={`today-booth-${booth.id}`} className="flex items-center gap-2 border-b border-maple-200 px-4 py-2 text-lg font-semibold text-lacquer-900">
        <BoothMark identity={identity} className="h-5 w-3" />
        {booth.name}
      </h3>
      <div className="grid gap-4 p-4 md:grid-cols-2">
        {days.map((day) => (
          <div key={day.date}>
            <h4 className="font-semibold text-maple-800">
              {day.label} <span className="font-normal text-maple-700">({formatShopDate(new Date(`${day.date}T12:00:00Z`), 'UTC')})</span>
            </h4>
            {day.sessions.length === 0 ? (
              <p className="mt-1 text-maple-700">Nothing booked.</p>
            ) : (
              <ul aria-label={`${booth.name}, ${day.label.toLowerCase()}`}>
                {day.sessions.map((session) => (
                  <SessionRow key={session.id} session={session} sprayers={ofSite} timeZone={timeZone} />
                ))}
              </ul>
            )}
          </div>
        ))}
      </div>
      <p className="border-t border-maple-200 px-4 py-2 text-sm">
        <Link to={`/planner?day=${days[0]?.date ?? ''}`} className="font-medium text-lacquer-800 underline underline-offset-4">
          Plan {booth.name} in the booth planner
        </Link>
      </p>
    </section>
  );
}
