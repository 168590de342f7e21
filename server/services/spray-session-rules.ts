import { openingHoursProblem } from '../../shared/finishing/opening-hours';
import type { SiteData } from '../data/site-data';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { calendarDateIn } from '../../shared/time';
import { AppError } from '../lib/app-error';

export interface Slot {
  id?: number;
  boothId: number;
  startAt: string;
  endAt: string;
  sprayerId: number | null;
}

const clock = (iso: string, timeZone: string) => new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));
const timeOnly = (iso: string, timeZone: string) => new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));

/** "Tue 6 Jul, 09:00–09:55", or both dates when the span crosses midnight. */
function span(startIso: string, endIso: string, timeZone: string): string {
  const sameDay = calendarDateIn(new Date(startIso), timeZone) === calendarDateIn(new Date(endIso), timeZone);
  return `${clock(startIso, timeZone)}–${sameDay ? timeOnly(endIso, timeZone) : clock(endIso, timeZone)}`;
}

/** A clash is a fact of the booth and the person, whichever site's sessions it is with. */
async function overlapping(tx: SiteData, slot: Slot, column: 'booth_id' | 'sprayer_id', value: number): Promise<SpraySessionEntity | null> {
  const qb = tx.acrossSites.spraySessions
    .select('s')
    .where(`s.${column} = :value`, { value })
    .andWhere("s.state <> 'cancelled'")
    .andWhere('s.start_at < :end AND s.end_at > :start', { start: slot.startAt, end: slot.endAt });
  if (slot.id) qb.andWhere('s.id <> :id', { id: slot.id });
  return qb.orderBy('s.start_at', 'ASC').getOne();
}

/** Never overridable: one booth, one session at a time; one sprayer, one booth at a time. */
export async function assertNoClash(tx: SiteData, slot: Slot, booth: BoothEntity, timeZone: string): Promise<void> {
  if (tx.sql.dialect === 'postgres') {
    // Serialise bookings of one booth across every app instance until this transaction ends.
    await tx.sql.query('SELECT pg_advisory_xact_lock(7301, $1)', [slot.boothId]);
  }
  const clash = await overlapping(tx, slot, 'booth_id', slot.boothId);
  if (clash) {
    throw new AppError('conflict', `${booth.name} is already booked ${span(clash.startAt, clash.endAt, timeZone)} (spray session ${clash.id})`, { start: 'Overlaps another spray session of this booth' });
  }
  if (slot.sprayerId === null) return;
  const busy = await overlapping(tx, slot, 'sprayer_id', slot.sprayerId);
  if (busy) {
    const sprayer = await tx.forSite(booth.siteId).users.findOneBy({ id: slot.sprayerId });
    throw new AppError('conflict', `${sprayer?.name ?? 'The sprayer'} is already booked then (spray session ${busy.id}, ${clock(busy.startAt, timeZone)})`, { sprayerId: 'Already booked at that time' });
  }
}

/** Outside opening hours needs a lead's recorded reason; without one the booking is refused in words. */
export function assertOpen(slot: Slot, booth: BoothEntity, timeZone: string, overrideReason: string | null): void {
  const problem = openingHoursProblem(new Date(slot.startAt), new Date(slot.endAt), booth.openingHours, timeZone);
  if (problem && !overrideReason) {
    throw new AppError('outside_opening_hours', `${problem}. A lead may book it anyway with a reason.`, { start: problem, 'override.reason': 'Give a reason to book outside opening hours' });
  }
}
