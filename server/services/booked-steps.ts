import type { FinishStep } from '../../shared/finishing/readiness';
import type { SpraySessionState } from '../../shared/schemas/spray-session';
import { idListParam, type SiteData } from '../data/site-data';
import type { PartEntity } from '../db/entities/part.entity';
import { nextCoatStep, type CoatStep } from './part-coats';

/** One step of one part booked in a live session. */
export interface BookedPartStep {
  sessionId: number;
  partId: number;
  stepPosition: number;
  start: Date;
  end: Date;
  state: SpraySessionState;
}

/*
 * A live booking is one still to be sprayed: planned and not yet over, or under way whatever the
 * clock says (a session running late still holds its parts). Done, cancelled and planned-but-past
 * are not.
 */
const liveItemsSql = (idList: string, oneSite: boolean) => `
  SELECT i.part_id AS "partId", i.step_position AS "stepPosition", s.id AS "sessionId", s.start_at AS "startAt", s.end_at AS "endAt", s.state
  FROM spray_session_items i JOIN spray_sessions s ON s.id = i.spray_session_id
  WHERE i.part_id IN (${idList})
    AND (s.state IN ('checking', 'spraying', 'clearing') OR (s.state = 'planned' AND s.end_at > ?))
    ${oneSite ? 'AND s.booth_id IN (SELECT b.id FROM booths b WHERE b.site_id = ?)' : ''}
  ORDER BY i.id`;

interface LiveItem {
  partId: number;
  stepPosition: number | null;
  sessionId: number;
  startAt: string;
  endAt: string;
  state: SpraySessionState;
}

/** Items of live sessions on these parts, in the sessions `data`'s scope sees. */
function liveItemsOf(data: SiteData, partIds: number[], now: Date): Promise<LiveItem[]> {
  const { sql, scope } = data;
  const params: unknown[] = [idListParam(sql.dialect, partIds), now.toISOString()];
  if (scope.siteId !== null) params.push(scope.siteId);
  return sql.select<LiveItem>(liveItemsSql(sql.idList, scope.siteId !== null), params);
}

/**
 * The steps live sessions plan on these parts and have not sprayed yet, in the sessions `data`
 * sees (pass `data.acrossSites` when a booking anywhere counts). An item without a step means the
 * part's next coat step, read from its coats on record.
 */
export async function bookedStepsOf(
  data: SiteData,
  parts: Pick<PartEntity, 'id' | 'jobId'>[],
  context: { coats: Map<number, Pick<CoatStep, 'spraySessionId' | 'stepPosition'>[]>; steps: Map<number, FinishStep[]>; now: Date },
): Promise<BookedPartStep[]> {
  if (parts.length === 0) return [];
  const items = await liveItemsOf(data, parts.map((p) => p.id), context.now);
  const jobOf = new Map(parts.map((p) => [p.id, p.jobId]));
  return items.flatMap((item) => {
    const partId = Number(item.partId);
    const sessionId = Number(item.sessionId);
    const coats = context.coats.get(partId) ?? [];
    // Sprayed in this very session: the booking is spent, whatever step it named.
    if (coats.some((c) => c.spraySessionId === sessionId)) return [];
    const stepPosition = item.stepPosition ?? nextCoatStep(context.steps.get(jobOf.get(partId)!) ?? [], coats);
    if (stepPosition === null) return [];
    return [{ sessionId, partId, stepPosition: Number(stepPosition), start: new Date(item.startAt), end: new Date(item.endAt), state: item.state }];
  });
}
