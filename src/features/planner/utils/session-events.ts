import type { EventInput } from '@fullcalendar/core';
import { spraySessionStateLabels, type SpraySessionState } from '../../../../shared/schemas/spray-session';
import type { PlannerSession } from '../api/get-spray-sessions';

/** Colours only back up the words on each event (tailwind tokens: lacquer, verdict, maple). */
const stateColours: Record<SpraySessionState, { background: string; border: string; text: string }> = {
  planned: { background: '#1b5246', border: '#123630', text: '#ffffff' },
  checking: { background: '#2a7f69', border: '#17423a', text: '#ffffff' },
  spraying: { background: '#b4232a', border: '#7d1419', text: '#ffffff' },
  clearing: { background: '#a35a00', border: '#6e3d00', text: '#ffffff' },
  done: { background: '#776548', border: '#3f362a', text: '#ffffff' },
  cancelled: { background: '#faf8f4', border: '#95805c', text: '#3f362a' },
};

export const sprayerWords = (session: Pick<PlannerSession, 'sprayerName'>) => session.sprayerName ?? 'No sprayer yet';

/** "Booth 1 · Planned · Mina Castell": booth, state and sprayer in words, never by colour alone. */
export function sessionLabel(session: PlannerSession): string {
  return [session.boothName, spraySessionStateLabels[session.state], sprayerWords(session)].join(' · ');
}

/** Only a session still at "planned" may be dragged: once checks start, the booth is in use. */
export function isMovable(session: PlannerSession): boolean {
  return session.state === 'planned';
}

export function toCalendarEvent(session: PlannerSession, canWrite: boolean): EventInput {
  const colours = stateColours[session.state];
  return {
    id: String(session.id),
    title: sessionLabel(session),
    start: session.start,
    end: session.end,
    editable: canWrite && isMovable(session),
    backgroundColor: colours.background,
    borderColor: colours.border,
    textColor: colours.text,
    extendedProps: { session },
  };
}
