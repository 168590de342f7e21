import type { EventInput } from '@fullcalendar/core';
import { spraySessionStateLabels, type SpraySessionState } from '../../../../shared/schemas/spray-session';
import { boothIdentity, type BoothIdentity } from '../../../lib/booth-identity';
import type { SpraySession } from '../../../../shared/schemas/spray-session';

/** State chips: the colour only backs up the word (tailwind tokens: lacquer, verdict, maple). */
export const stateChipColours: Record<SpraySessionState, { background: string; text: string }> = {
  planned: { background: '#1b5246', text: '#ffffff' },
  checking: { background: '#2a7f69', text: '#ffffff' },
  spraying: { background: '#b4232a', text: '#ffffff' },
  clearing: { background: '#a35a00', text: '#ffffff' },
  done: { background: '#5c4e39', text: '#ffffff' },
  cancelled: { background: '#ffffff', text: '#3f362a' },
};

export const sprayerWords = (session: Pick<SpraySession, 'sprayerName'>) => session.sprayerName ?? 'No sprayer yet';

/** "Booth 1 · Planned · Mina Castell": booth, state and sprayer in words, never by colour alone. */
function sessionLabel(session: SpraySession): string {
  return [session.boothName, spraySessionStateLabels[session.state], sprayerWords(session)].join(' · ');
}

/** Only a session still at "planned" may be dragged: once checks start, the booth is in use. */
export function isMovable(session: SpraySession): boolean {
  return session.state === 'planned';
}

/** A block takes its booth's look: the booth's tint, its patterned band and ink, whatever its state. */
export function toCalendarEvent(session: SpraySession, canWrite: boolean, identity: BoothIdentity = boothIdentity(0)): EventInput {
  const cancelled = session.state === 'cancelled';
  return {
    id: String(session.id),
    title: sessionLabel(session),
    start: session.start,
    end: session.end,
    editable: canWrite && isMovable(session),
    backgroundColor: cancelled ? '#ffffff' : identity.tint,
    borderColor: identity.ink,
    textColor: '#2a241c',
    classNames: ['bw-session', ...(cancelled ? ['bw-session-cancelled'] : [])],
    extendedProps: { session, identity },
  };
}
