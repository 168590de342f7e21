import type { EventContentArg } from '@fullcalendar/core';
import { spraySessionStateLabels } from '../../../../shared/schemas/spray-session';
import type { PlannerSession } from '../api/get-spray-sessions';
import { sprayerWords } from '../utils/session-events';

/**
 * What each block on the calendar says: time, state, booth and sprayer, each in words. The state
 * comes second so even a short session shows it; the list and the summary say it all.
 */
export function SessionEventContent({ arg }: { arg: EventContentArg }) {
  const session = arg.event.extendedProps.session as PlannerSession;
  const cancelled = session.state === 'cancelled';
  const struck = cancelled ? 'line-through' : '';
  return (
    <div className="h-full overflow-hidden px-0.5 text-xs leading-snug" title={arg.event.title}>
      <p className={`truncate tabular-nums ${struck}`}>{arg.timeText}</p>
      <p className={`truncate font-semibold ${cancelled ? 'uppercase' : ''}`}>{spraySessionStateLabels[session.state]}</p>
      <p className={`line-clamp-2 font-semibold ${struck}`}>{session.boothName}</p>
      <p className={`truncate ${struck}`}>{sprayerWords(session)}</p>
    </div>
  );
}
