import type { EventSourceInput } from '@fullcalendar/core';
import type { SpraySession } from '../../../../shared/schemas/spray-session';

/** Background shading reaches this far either side of the window, past anything a week view shows. */
const reachMs = 21 * 86_400_000;
export const recoatSourceId = 'recoat-window';

const formats = new Map<string, Intl.DateTimeFormat>();
function dayAndTime(ms: number, timeZone: string): string {
  let format = formats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
    formats.set(timeZone, format);
  }
  return format.format(new Date(ms));
}

/**
 * The session's recoat window as shading behind the calendar: too soon before it opens, the
 * window itself, and closed (denib first) after it closes. Null when the parts wait for nothing.
 */
export function recoatWindowSource(session: SpraySession, timeZone: string): EventSourceInput | null {
  const window = session.work.recoatWindow;
  if (!window) return null;
  const opens = Date.parse(window.opensAt);
  const closes = window.closesAt ? Date.parse(window.closesAt) : null;
  // Far enough either way to cover the weeks around both the window and the session itself.
  const start = Date.parse(session.start);
  const earliest = Math.min(opens, start) - reachMs;
  const latest = Math.max(closes ?? opens, start) + reachMs;
  const from = window.projected ? ' (from the booked coat before)' : '';
  const shade = (start: number, end: number, title: string, colour: string, kind: string) => ({
    start,
    end,
    title,
    display: 'background',
    backgroundColor: colour,
    classNames: ['bw-recoat', `bw-recoat-${kind}`],
    extendedProps: { recoat: true },
  });
  const events = [
    shade(earliest, opens, `Too soon: recoat opens ${dayAndTime(opens, timeZone)}${from}`, '#b4232a', 'too-soon'),
    shade(opens, closes ?? latest, closes ? `Recoat window until ${dayAndTime(closes, timeZone)}${from}` : `Recoat window from ${dayAndTime(opens, timeZone)}, no closing time${from}`, '#1c7c3c', 'open'),
  ];
  if (closes) events.push(shade(closes, latest, `Window closed ${dayAndTime(closes, timeZone)}: denib first`, '#a35a00', 'closed'));
  return { id: recoatSourceId, events };
}
