import { spraySessionStateLabels } from '../../../../shared/schemas/spray-session';
import { BoothMark } from '../../../components/ui/booth-mark';
import type { BoothIdentity } from '../../../lib/booth-identity';
import { sessionWorkLine } from '../../../lib/session-work-words';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { sprayerWords } from '../utils/session-events';
import { sessionWhen } from '../utils/session-time';

interface SessionListProps {
  sessions: SpraySession[];
  timeZone: string;
  title: string;
  identities: Map<number, BoothIdentity>;
  onOpen: (id: number) => void;
}

/**
 * The same sessions as a list: a way in for keyboards and screen readers, and the easiest read
 * on a phone. Each row says what is sprayed and opens the session's summary.
 */
export function SessionList({ sessions, timeZone, title, identities, onOpen }: SessionListProps) {
  return (
    <section aria-labelledby="planner-session-list" className="mt-6">
      <h2 id="planner-session-list" className="mb-2 text-lg font-semibold text-lacquer-900">
        Sessions, {title}
      </h2>
      {sessions.length === 0 ? (
        <p className="rounded-panel border border-dashed border-maple-400 bg-white p-4 text-maple-700">No spray sessions booked in this stretch.</p>
      ) : (
        <ul className="divide-y divide-maple-200 rounded-panel border border-maple-300 bg-white">
          {sessions.map((session) => (
            <li key={session.id}>
              <button type="button" onClick={() => onOpen(session.id)} className="flex min-h-touch w-full items-stretch gap-3 px-3 py-2 text-left hover:bg-maple-50">
                <BoothMark identity={identities.get(session.boothId)} className="w-2 self-stretch" />
                <span className="flex min-w-0 flex-1 flex-col">
                  <span className="flex flex-wrap items-baseline gap-x-3">
                    <span className={`tabular-nums font-semibold ${session.state === 'cancelled' ? 'line-through' : ''}`}>{sessionWhen(session, timeZone)}</span>
                    <span>{session.boothName}</span>
                    <span className="font-medium">{spraySessionStateLabels[session.state]}</span>
                    <span className="text-maple-700">{sprayerWords(session)}</span>
                  </span>
                  <span className="text-sm text-maple-800">{sessionWorkLine(session.work)}</span>
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
