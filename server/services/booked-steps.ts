import { In } from 'typeorm';
import type { FinishStep } from '../../shared/finishing/readiness';
import type { SpraySessionState } from '../../shared/schemas/spray-session';
import type { SiteData } from '../data/site-data';
import type { PartEntity } from '../db/entities/part.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { nextCoatStep, type CoatTimes } from './part-coats';

/** One step of one part booked in a live session. */
export interface BookedPartStep {
  sessionId: number;
  partId: number;
  stepPosition: number;
  start: Date;
  end: Date;
  state: SpraySessionState;
}

const underWay: SpraySessionState[] = ['checking', 'spraying', 'clearing'];

/**
 * A booking still to be sprayed: planned and not yet over, or under way whatever the clock says
 * (a session running late still holds its parts). Done, cancelled and planned-but-past are not.
 */
export function isLiveBooking(session: Pick<SpraySessionEntity, 'state' | 'endAt'>, now: Date): boolean {
  return underWay.includes(session.state) || (session.state === 'planned' && session.endAt > now.toISOString());
}

/**
 * The steps live sessions plan on these parts and have not sprayed yet, in the sessions `data`
 * sees (pass `data.acrossSites` when a booking anywhere counts). An item without a step means the
 * part's next coat step, read from its coats on record.
 */
export async function bookedStepsOf(
  data: SiteData,
  parts: PartEntity[],
  context: { coats: Map<number, CoatTimes[]>; steps: Map<number, FinishStep[]>; now: Date },
): Promise<BookedPartStep[]> {
  if (parts.length === 0) return [];
  const items = await data.spraySessionItems.find({ where: { partId: In(parts.map((p) => p.id)) } });
  const sessionIds = [...new Set(items.map((i) => i.spraySessionId))];
  const sessions = sessionIds.length ? await data.spraySessions.findBy({ id: In(sessionIds) }) : [];
  const live = new Map(sessions.filter((s) => isLiveBooking(s, context.now)).map((s) => [s.id, s]));
  const jobOf = new Map(parts.map((p) => [p.id, p.jobId]));
  return items.flatMap((item) => {
    const session = live.get(item.spraySessionId);
    const coats = context.coats.get(item.partId) ?? [];
    // Sprayed in this very session: the booking is spent, whatever step it named.
    if (!session || coats.some((c) => c.spraySessionId === session.id)) return [];
    const stepPosition = item.stepPosition ?? nextCoatStep(context.steps.get(jobOf.get(item.partId)!) ?? [], coats);
    if (stepPosition === null) return [];
    return [{ sessionId: session.id, partId: item.partId, stepPosition, start: new Date(session.startAt), end: new Date(session.endAt), state: session.state }];
  });
}
