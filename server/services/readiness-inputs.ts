import type { PartBooking } from '../../shared/finishing/job-ready-time';
import { groupBy } from '../../shared/group-by';
import { partReadiness, type FinishStep, type PartReadiness, type ReadinessInput } from '../../shared/finishing/readiness';
import { idListParam, type SiteData } from '../data/site-data';
import { mapInSlices } from '../lib/in-slices';
import type { PartEntity } from '../db/entities/part.entity';
import { currentCoatsByPart, denibTimesByPart, stepsByJob, toPartCoats, unplannedPartCoats, type CoatTimes } from './part-coats';

export interface PartFacts {
  steps: FinishStep[];
  coats: CoatTimes[];
  input: ReadinessInput;
}

/**
 * What the readiness maths needs for each part: its finish system, current coats, denibs and
 * collection. These are facts about the part, so every coat and denib counts whichever site did
 * it; callers show the result only for parts their scope sees.
 */
export async function partFactsOf(data: SiteData, parts: PartEntity[], now: Date): Promise<Map<number, PartFacts>> {
  const whole = data.acrossSites;
  const ids = parts.map((p) => p.id);
  // One after another: inside a transaction on PostgreSQL the manager has a single connection.
  const coats = await currentCoatsByPart(whole, ids);
  const denibs = await denibTimesByPart(whole, ids);
  const steps = await stepsByJob(whole, parts);
  const facts = await mapInSlices(parts, (slice) =>
    slice.map((part): [number, PartFacts] => {
      const system = steps.get(part.jobId) ?? [];
      const partCoats = coats.get(part.id) ?? [];
      const collectedAt = part.collectedAt ? new Date(part.collectedAt) : null;
      const input = { steps: system, coats: toPartCoats(partCoats, system), unplannedCoats: unplannedPartCoats(partCoats, system), abradedAt: denibs.get(part.id) ?? [], collectedAt, now };
      return [part.id, { steps: system, coats: partCoats, input }];
    }),
  );
  return new Map(facts);
}

/** Readiness of each part at `now`, from its current coats, its denibs and its job's finish system. */
export async function readinessOf(data: SiteData, parts: PartEntity[], now: Date): Promise<Map<number, PartReadiness>> {
  const facts = await partFactsOf(data, parts, now);
  return new Map([...facts].map(([id, fact]) => [id, partReadiness(fact.input)]));
}

const liveBookingsSql = (idList: string) => `
  SELECT i.part_id AS "partId", i.step_position AS "stepPosition", s.start_at AS "startAt"
  FROM spray_session_items i JOIN spray_sessions s ON s.id = i.spray_session_id
  WHERE i.part_id IN (${idList}) AND s.state NOT IN ('done', 'cancelled', 'clearing')
  ORDER BY i.id`;

/**
 * Spray sessions still to run (or running) that plan each part, as the ready-time maths reads
 * them: only their start and step, whichever site booked them, so a part's expected time is the
 * same wherever it is read.
 */
export async function bookingsByPart(data: SiteData, partIds: number[]): Promise<Map<number, PartBooking[]>> {
  if (partIds.length === 0) return new Map();
  const { sql } = data.acrossSites;
  const rows = await sql.select<{ partId: number; stepPosition: number | null; startAt: string }>(liveBookingsSql(sql.idList), [idListParam(sql.dialect, partIds)]);
  return groupBy(
    rows,
    (row) => Number(row.partId),
    (row): PartBooking => ({ startAt: new Date(row.startAt), stepIndex: row.stepPosition === null ? null : Number(row.stepPosition) }),
  );
}
