import { openingHoursProblem } from '../../shared/finishing/opening-hours';
import type { SiteData } from '../data/site-data';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { In } from 'typeorm';
import { shopMomentWords, shopSpanWords, type ShopFormat } from '../../shared/words';
import { AppError } from '../lib/app-error';

export interface Slot {
  id?: number;
  boothId: number;
  startAt: string;
  endAt: string;
  sprayerId: number | null;
}

/** " for LJ-26-101" (or "… and LJ-26-104"), naming the jobs a session sprays; "" when none is planned in it. */
async function jobsWords(tx: SiteData, spraySessionId: number): Promise<string> {
  const whole = tx.acrossSites;
  const items = await whole.spraySessionItems.findBy({ spraySessionId });
  const parts = items.length ? await whole.parts.findBy({ id: In([...new Set(items.map((i) => i.partId))]) }) : [];
  const jobs = parts.length ? await whole.jobs.findBy({ id: In([...new Set(parts.map((p) => p.jobId))]) }) : [];
  const references = jobs.map((j) => j.reference).sort();
  if (references.length === 0) return '';
  return ` for ${references.length === 1 ? references[0] : `${references.slice(0, -1).join(', ')} and ${references.at(-1)}`}`;
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
export async function assertNoClash(tx: SiteData, slot: Slot, booth: BoothEntity, shop: ShopFormat): Promise<void> {
  if (tx.sql.dialect === 'postgres') {
    // Serialise bookings of one booth across every app instance until this transaction ends.
    await tx.sql.query('SELECT pg_advisory_xact_lock(7301, $1)', [slot.boothId]);
  }
  const clash = await overlapping(tx, slot, 'booth_id', slot.boothId);
  if (clash) {
    const when = shopSpanWords(new Date(clash.startAt), new Date(clash.endAt), shop);
    throw new AppError('conflict', `${booth.name} is already booked ${when}${await jobsWords(tx, clash.id)}`, { start: 'Overlaps another spray session of this booth' });
  }
  if (slot.sprayerId === null) return;
  const busy = await overlapping(tx, slot, 'sprayer_id', slot.sprayerId);
  if (busy) {
    const sprayer = await tx.forSite(booth.siteId).users.findOneBy({ id: slot.sprayerId });
    const where = await tx.acrossSites.booths.findOneBy({ id: busy.boothId });
    const session = `${where?.name ?? 'another booth'} from ${shopMomentWords(new Date(busy.startAt), shop)}${await jobsWords(tx, busy.id)}`;
    throw new AppError('conflict', `${sprayer?.name ?? 'The sprayer'} is already booked then: ${session}`, { sprayerId: 'Already booked at that time' });
  }
}

/** Outside opening hours needs a lead's recorded reason; without one the booking is refused in words. */
export function assertOpen(slot: Slot, booth: BoothEntity, timeZone: string, overrideReason: string | null): void {
  const problem = openingHoursProblem(new Date(slot.startAt), new Date(slot.endAt), booth.openingHours, timeZone);
  if (problem && !overrideReason) {
    throw new AppError('outside_opening_hours', `${problem}. A lead may book it anyway with a reason.`, { start: problem, 'override.reason': 'Give a reason to book outside opening hours' });
  }
}
