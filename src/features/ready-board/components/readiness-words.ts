import { missedWindowScuffGrit } from '../../../../shared/finishing/readiness';
import { calendarDateIn } from '../../../../shared/time';
import { formatMinutes } from '../../../lib/durations';
import { formatShopClock } from '../../../lib/shop-time';
import type { BoardPart } from './readiness';

/** Time left as a board shows it, to the minute and rounded up, so "0 min" never shows while still waiting. */
export function timeUntil(iso: string, now: Date): string {
  return formatMinutes(Math.max(1, Math.ceil((Date.parse(iso) - now.getTime()) / 60_000)));
}

/** "10:42" today in the shop, "3 Dec 10:42" on another day. */
export function shopMoment(iso: string, now: Date, timeZone: string): string {
  const at = new Date(iso);
  const clock = formatShopClock(at, timeZone);
  if (calendarDateIn(at, timeZone) === calendarDateIn(now, timeZone)) return clock;
  const day = new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short' }).format(at);
  return `${day} ${clock}`;
}

export function coatWords(part: BoardPart): string {
  if (part.coatsTotal === 0) return 'No finish system';
  if (part.coatsDone === 0) return `No coats yet (${part.coatsTotal} to go)`;
  return `Coat ${part.coatsDone} of ${part.coatsTotal}`;
}

/** The server names an abrade step "Abrade P320"; in the shop between coats that is a denib. */
function denibWords(nextStep: string | null): string {
  const grit = /^Abrade (.+)$/.exec(nextStep ?? '')?.[1];
  return grit ? `Denib ${grit} needed` : 'Denib needed';
}

const ahead = (iso: string | null, now: Date): iso is string => iso !== null && Date.parse(iso) > now.getTime();

/** "Handle in 1 h 20 min" or "Ready to handle since 10:42", for one of the three drying milestones. */
function milestone(iso: string | null, label: { before: string; since: string }, now: Date, timeZone: string): string | null {
  if (iso === null) return null;
  return ahead(iso, now) ? `${label.before} in ${timeUntil(iso, now)}` : `${label.since} since ${shopMoment(iso, now, timeZone)}`;
}

const handle = { before: 'Handle', since: 'Ready to handle' };
// Between coats a part can be moved once touch-dry enough to handle, but it is not finished.
const handleBetweenCoats = { before: 'Handle', since: 'Can be moved' };
const pack = { before: 'Pack', since: 'Ready to pack' };
const cure = { before: 'Full cure', since: 'Fully cured' };

/** What the next coat waits for, for a part between coats. */
function nextCoatLines(part: BoardPart, now: Date, timeZone: string): string[] {
  const { nextWindowOpensAt: opens, nextWindowClosesAt: closes } = part;
  if (part.windowMissed && closes) return [`Recoat window closed at ${shopMoment(closes, now, timeZone)}`, `Denib ${missedWindowScuffGrit} needed before the next coat`];
  const lines = part.abradeRequired ? [denibWords(part.nextStep)] : part.nextStep ? [`Next: ${part.nextStep.toLowerCase()}`] : [];
  if (ahead(opens, now)) lines.push(`Next coat from ${shopMoment(opens, now, timeZone)} (in ${timeUntil(opens, now)})`);
  else if (closes) lines.push(`Recoat window open until ${shopMoment(closes, now, timeZone)} (${timeUntil(closes, now)} left)`);
  else if (opens) lines.push('Ready for the next coat');
  return lines;
}

/** The headline and the smaller lines under it, all in words. */
export function partLines(part: BoardPart, now: Date, timeZone: string): { headline: string; details: string[] } {
  const at = (iso: string | null, label: typeof handle) => milestone(iso, label, now, timeZone);
  const present = (lines: (string | null)[]) => lines.filter((line): line is string => line !== null);
  switch (part.shownState) {
    case 'waiting':
      return { headline: 'Not sprayed yet', details: part.nextStep ? [`First: ${part.nextStep.toLowerCase()}`] : [] };
    case 'in-finish':
      return { headline: 'Between coats', details: present([...nextCoatLines(part, now, timeZone), at(part.handleAt, handleBetweenCoats)]) };
    case 'drying':
      return { headline: at(part.handleAt, handle) ?? 'Drying', details: present([at(part.packAt, pack), at(part.fullCureAt, cure)]) };
    case 'ready-to-handle':
      return { headline: at(part.handleAt, handle) ?? 'Ready to handle', details: present([at(part.packAt, pack), at(part.fullCureAt, cure)]) };
    case 'ready-to-pack':
      return { headline: at(part.packAt, pack) ?? 'Ready to pack', details: present([at(part.fullCureAt, cure)]) };
    case 'cured':
      return { headline: at(part.fullCureAt, cure) ?? 'Fully cured', details: [] };
    case 'collected':
      return { headline: 'Collected from the rack', details: [] };
  }
}
