import { missedWindowScuffGrit } from '../../../../shared/finishing/readiness';
import { shopMoment, timeUntil } from '../../../lib/ready-time-words';
import type { BoardPart } from './readiness';
import { coatOfWords, denibNeededWords, upperFirst } from '../../../../shared/words';

export { shopMoment, timeUntil };

export function coatWords(part: BoardPart): string {
  if (part.coatsTotal === 0) return 'No finish system';
  if (part.coatsDone === 0) return `No coats yet (${part.coatsTotal} to go)`;
  return `${part.coatsDone} of ${part.coatsTotal} coats on`;
}

/** "Denib with P320 needed": the grit of the denib step next, or the scuff grit after a missed window. */
function denibNeeded(part: BoardPart): string {
  return denibNeededWords((part.nextStepKind === 'denib' ? part.nextStepGrit : null) ?? missedWindowScuffGrit);
}

const ahead = (iso: string | null, now: Date): iso is string => iso !== null && Date.parse(iso) > now.getTime();

/** "Handle in 1 h 20 min" or "Ready to handle since 10:42", for one of the three drying milestones. */
function milestone(iso: string | null, label: { before: string; since: string }, now: Date, timeZone: string): string | null {
  if (iso === null) return null;
  return ahead(iso, now) ? `${label.before} in ${timeUntil(iso, now)}` : `${label.since} since ${shopMoment(iso, now, timeZone)}`;
}

const handle = { before: 'Handle', since: 'Ready to handle' };
const pack = { before: 'Pack', since: 'Ready to pack' };
const cure = { before: 'Full cure', since: 'Fully cured' };

const nextCoat = (part: BoardPart) => coatOfWords(Math.min(part.coatsDone + 1, part.coatsTotal), part.coatsTotal);

/** What a part between coats needs next, as its headline: never a handle time while coats remain. */
function nextWords(part: BoardPart): string {
  if (part.windowMissed || part.abradeRequired) return `${part.windowMissed ? denibNeededWords(missedWindowScuffGrit) : denibNeeded(part)}, then ${nextCoat(part)}`;
  return `${upperFirst(nextCoat(part))} next`;
}

/** When the window for the next coat opens and closes, and whether a denib is on record since the last coat. */
function windowLines(part: BoardPart, now: Date, timeZone: string): string[] {
  const { nextWindowOpensAt: opens, nextWindowClosesAt: closes } = part;
  if (part.windowMissed && closes) return [`Recoat window closed at ${shopMoment(closes, now, timeZone)}`];
  const lines = part.denibbedAt ? [`Denibbed at ${shopMoment(part.denibbedAt, now, timeZone)}`] : [];
  if (ahead(opens, now)) lines.push(`Window opens ${shopMoment(opens, now, timeZone)} (in ${timeUntil(opens, now)})`);
  else if (closes) lines.push(`Window open until ${shopMoment(closes, now, timeZone)} (${timeUntil(closes, now)} left)`);
  else if (opens) lines.push('Window open, no closing time');
  return lines;
}

/** When the part will be ready to handle once its remaining coats are on: an estimate, said so. */
function expectedLine(part: BoardPart, now: Date, timeZone: string): string | null {
  if (!part.expectedHandleAt || part.coatsRemaining === 0) return null;
  const coats = `${part.coatsRemaining} ${part.coatsRemaining === 1 ? 'coat' : 'coats'} to go`;
  return `Ready to handle from about ${shopMoment(part.expectedHandleAt, now, timeZone)} (estimate, ${coats})`;
}

/** Between coats a part may be moved to another rack once dry enough, but it is not ready. */
function movableLine(part: BoardPart, now: Date, timeZone: string): string | null {
  if (!part.handleAt) return null;
  return ahead(part.handleAt, now) ? `Can be moved between racks from ${shopMoment(part.handleAt, now, timeZone)}` : `Can be moved between racks since ${shopMoment(part.handleAt, now, timeZone)}`;
}

function collectedLines(part: BoardPart, now: Date, timeZone: string): { headline: string; details: string[] } {
  const from = part.collectedFrom ? [`Taken from ${part.collectedFrom.name}${part.collectedFrom.shelf != null ? `, shelf ${part.collectedFrom.shelf}` : ''}`] : [];
  return { headline: part.collectedAt ? `Collected ${shopMoment(part.collectedAt, now, timeZone)}` : 'Collected from the rack', details: from };
}

/** The headline and the smaller lines under it, all in words. */
export function partLines(part: BoardPart, now: Date, timeZone: string): { headline: string; details: string[] } {
  const at = (iso: string | null, label: typeof handle) => milestone(iso, label, now, timeZone);
  const present = (lines: (string | null)[]) => lines.filter((line): line is string => line !== null);
  switch (part.shownState) {
    case 'waiting':
      if (part.coatsTotal === 0) return { headline: 'Not sprayed yet', details: [] };
      return { headline: 'Not sprayed yet', details: present([part.abradeRequired ? `First: ${denibNeeded(part).toLowerCase()}` : `First: ${nextCoat(part)}`, expectedLine(part, now, timeZone)]) };
    case 'in-finish':
      return { headline: nextWords(part), details: present([...windowLines(part, now, timeZone), movableLine(part, now, timeZone), expectedLine(part, now, timeZone)]) };
    case 'drying':
      return { headline: at(part.handleAt, handle) ?? 'Drying', details: present([at(part.packAt, pack), at(part.fullCureAt, cure)]) };
    case 'ready-to-handle':
      return { headline: at(part.handleAt, handle) ?? 'Ready to handle', details: present([at(part.packAt, pack), at(part.fullCureAt, cure)]) };
    case 'ready-to-pack':
      return { headline: at(part.packAt, pack) ?? 'Ready to pack', details: present([at(part.fullCureAt, cure)]) };
    case 'cured':
      return { headline: at(part.fullCureAt, cure) ?? 'Fully cured', details: [] };
    case 'collected':
      return collectedLines(part, now, timeZone);
  }
}
