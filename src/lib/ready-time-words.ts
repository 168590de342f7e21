import type { ReadyJob } from '../../shared/schemas/ready';
import { calendarDateIn } from '../../shared/time';
import { formatQuantity } from '../../shared/units';
import type { UnitSystem } from '../../shared/schemas/common';
import { formatMinutes } from './durations';
import { formatShopClock } from './shop-time';

/** Time left as a board shows it, to the minute and rounded up, so "0 min" never shows while still waiting. */
export function timeUntil(iso: string, now: Date): string {
  return formatMinutes(Math.max(1, Math.ceil((Date.parse(iso) - now.getTime()) / 60_000)));
}

/** "10:42" today in the shop, "tomorrow 10:42", else "Thu 3 Dec 10:42". */
export function shopMoment(iso: string, now: Date, timeZone: string): string {
  const at = new Date(iso);
  const clock = formatShopClock(at, timeZone);
  const day = calendarDateIn(at, timeZone);
  if (day === calendarDateIn(now, timeZone)) return clock;
  if (day === calendarDateIn(new Date(now.getTime() + 86_400_000), timeZone)) return `tomorrow ${clock}`;
  const date = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short' }).format(at);
  return `${date} ${clock}`;
}

const ahead = (iso: string, now: Date) => Date.parse(iso) > now.getTime();

/** "Ready to handle at 14:30 (in 2 h)", "… since 10:42", or for an estimate "… from about tomorrow 09:15". */
function milestoneWords(what: string, iso: string, now: Date, timeZone: string, estimate: boolean): string {
  if (!ahead(iso, now)) return `${what} since ${shopMoment(iso, now, timeZone)}`;
  return `${what} ${estimate ? 'from about' : 'at'} ${shopMoment(iso, now, timeZone)} (in ${timeUntil(iso, now)})`;
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** A whole job's readiness for the assembler: a headline, the pack time, and what the estimate assumes. */
export function jobReadyLines(job: ReadyJob, now: Date, timeZone: string, units: UnitSystem): { headline: string; details: string[] } {
  if (job.partsCounted === 0) return { headline: job.partsCollected > 0 ? 'Every part has been collected' : 'No parts yet', details: [] };
  if (job.partsUnknown > 0 || !job.handleAt || !job.packAt) {
    return { headline: 'Ready time not known yet', details: [`${plural(job.partsUnknown, 'part')} with no finish system, or a product without drying times.`] };
  }
  const estimate = job.projected;
  const details = [milestoneWords('Whole job ready to pack', job.packAt, now, timeZone, estimate)];
  if (estimate) {
    const temp = formatQuantity(job.dryingTempC, 'temperature', units);
    details.push(`${plural(job.coatsRemaining, 'coat')} still to go on. Estimate: each coat as soon as its recoat window opens (or at its booked session), drying at ${temp}, the shop’s expected drying temperature.`);
  }
  return { headline: milestoneWords('Whole job ready to handle', job.handleAt, now, timeZone, estimate), details };
}
