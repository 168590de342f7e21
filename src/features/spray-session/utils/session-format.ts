import { missedWindowScuffGrit } from '../../../../shared/finishing/readiness';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import { calendarDateIn } from '../../../../shared/time';
import { formatShopClock, zoneNearClockChange } from '../../../lib/shop-time';
import { coatOfWords, denibWords } from '../../../../shared/words';

const dayFormats = new Map<string, Intl.DateTimeFormat>();

function shopDay(at: Date, timeZone: string): string {
  let format = dayFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short' });
    dayFormats.set(timeZone, format);
  }
  return format.format(at);
}

/** "10:24" today, "Thu 3 Dec, 10:24" on any other day of the shop's calendar. */
export function shopWhen(iso: string, timeZone: string, now: Date = new Date()): string {
  const at = new Date(iso);
  if (Number.isNaN(at.getTime())) return '—';
  const clock = formatShopClock(at, timeZone);
  return calendarDateIn(at, timeZone) === calendarDateIn(now, timeZone) ? clock : `${shopDay(at, timeZone)}, ${clock}`;
}

/** "Wed 2 Dec, 09:00–11:00"; in the week either side of a clock change "… GMT", to say which side it is. */
export function sessionSpan({ start, end }: { start: string; end: string }, timeZone: string): string {
  const from = new Date(start);
  return `${shopDay(from, timeZone)}, ${formatShopClock(from, timeZone)}–${formatShopClock(new Date(end), timeZone)}${zoneNearClockChange(from, timeZone)}`;
}

/** A countdown as it reads on a board: "1 h 05 min" above an hour, "4:09" below. */
export function remainingWords(ms: number): string {
  const totalSeconds = Math.max(0, Math.ceil(ms / 1000));
  const hours = Math.floor(totalSeconds / 3600);
  const minutes = Math.floor((totalSeconds % 3600) / 60);
  const seconds = totalSeconds % 60;
  if (hours > 0) return `${hours} h ${String(minutes).padStart(2, '0')} min`;
  return `${minutes}:${String(seconds).padStart(2, '0')}`;
}

/** For screen readers: whole minutes only, so a live region changes at most once a minute. */
export function remainingMinutesWords(ms: number): string {
  const minutes = Math.max(0, Math.ceil(ms / 60_000));
  if (minutes >= 120) return `about ${Math.round(minutes / 60)} hours`;
  return minutes === 1 ? '1 minute' : `${minutes} minutes`;
}

/**
 * In the booth's words, as the denib section and the ready board say it: "denib with P320, then
 * coat 2 of 3", or "coat 2 of 3 (40 µm dry)", from the server's structured next step.
 */
export function nextStepWords(part: Pick<ReadyPart, 'nextStepKind' | 'nextStepGrit' | 'nextStepDryFilmUm' | 'abradeRequired' | 'coatsDone' | 'coatsTotal'>): string {
  const coat = coatOfWords(Math.min(part.coatsDone + 1, part.coatsTotal), part.coatsTotal);
  if (part.nextStepKind === 'denib') return `${denibWords(part.nextStepGrit ?? missedWindowScuffGrit)}, then ${coat}`;
  const film = part.nextStepKind === 'coat' && part.nextStepDryFilmUm !== null ? `${part.nextStepDryFilmUm} µm dry` : null;
  const words = film ? `${coat} (${film})` : coat;
  return part.abradeRequired ? `${denibWords(missedWindowScuffGrit)} first (the window was missed), then ${words}` : words;
}
