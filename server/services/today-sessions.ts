import { In } from 'typeorm';
import { effectiveClearance } from '../../shared/finishing/booth-air';
import { sessionNextStep } from '../../shared/finishing/day-board';
import type { SpraySession } from '../../shared/schemas/spray-session';
import type { TodaySession } from '../../shared/schemas/today';
import { calendarDateIn } from '../../shared/time';
import type { SiteData } from '../data/site-data';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { toSpraySessionDtos } from './spray-session-dto';
import type { WorkContext } from './spray-session-work';

export interface SessionWindow {
  from: Date;
  to: Date;
  /** Only this sprayer's sessions; `null` only sessions nobody has been given; undefined everyone's. */
  sprayerId?: number | null;
}

/** Live and finished sessions (not cancelled) of the scope's booths overlapping the window, by start. */
export async function sessionsIn(data: SiteData, window: SessionWindow): Promise<SpraySessionEntity[]> {
  const qb = data.spraySessions
    .select('s')
    .where("s.state <> 'cancelled'")
    .andWhere('s.start_at < :to AND s.end_at > :from', { from: window.from.toISOString(), to: window.to.toISOString() });
  if (window.sprayerId === null) qb.andWhere('s.sprayer_id IS NULL');
  else if (window.sprayerId !== undefined) qb.andWhere('s.sprayer_id = :sprayerId', { sprayerId: window.sprayerId });
  return qb.orderBy('s.start_at', 'ASC').addOrderBy('s.id', 'ASC').getMany();
}

/** What the next-step rule needs beyond the session itself: pots in their pot life, which products need one, booth clearance. */
async function nextStepFacts(data: SiteData, sessions: SpraySession[], now: Date) {
  const ids = sessions.map((s) => s.id);
  const productIds = [...new Set(sessions.flatMap((s) => s.work.coats.map((c) => c.productId)))];
  const boothIds = [...new Set(sessions.map((s) => s.boothId))];
  const [mixes, products, booths] = await Promise.all([
    ids.length ? data.mixes.findBy({ spraySessionId: In(ids) }) : [],
    productIds.length ? data.products.find({ where: { id: In(productIds) }, select: { id: true, mixHardenerParts: true } }) : [],
    boothIds.length ? data.booths.findBy({ id: In(boothIds) }) : [],
  ]);
  const livePot = (sessionId: number, productId: number) => mixes.some((m) => m.spraySessionId === sessionId && m.productId === productId && (!m.potLifeEndsAt || m.potLifeEndsAt > now.toISOString()));
  const twoPack = new Set(products.filter((p) => p.mixHardenerParts > 0).map((p) => p.id));
  const clearanceMin = new Map(booths.map((b) => [b.id, effectiveClearance(b).minutes]));
  return { livePot, twoPack, clearanceMin };
}

/** Sessions for the day's board: each with what it sprays and the next thing to do in it. */
export async function toTodaySessions(data: SiteData, entities: SpraySessionEntity[], context: WorkContext & { timeZone: string }): Promise<TodaySession[]> {
  const sessions = await toSpraySessionDtos(data, entities, context);
  const facts = await nextStepFacts(data, sessions, context.now);
  return sessions.map((s) => {
    const clearing = s.clearingStartedAt ? new Date(Date.parse(s.clearingStartedAt) + (facts.clearanceMin.get(s.boothId) ?? 0) * 60_000) : null;
    const coats = s.work.coats.map((c) => ({ ...c, needsMix: facts.twoPack.has(c.productId), mixed: facts.livePot(s.id, c.productId) }));
    const next = sessionNextStep({ state: s.state, checklist: s.checklist, coats, clearanceEndsAt: clearing, now: context.now });
    return {
      id: s.id,
      boothId: s.boothId,
      boothName: s.boothName,
      start: s.start,
      end: s.end,
      date: calendarDateIn(new Date(s.start), context.timeZone),
      sprayerId: s.sprayerId,
      sprayerName: s.sprayerName,
      state: s.state,
      work: s.work,
      nextStep: { kind: next.kind, words: next.words, at: next.at ? next.at.toISOString() : null },
    };
  });
}
