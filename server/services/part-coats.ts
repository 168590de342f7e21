import { In } from 'typeorm';
import type { FinishStep, PartCoat, ReadinessInput } from '../../shared/finishing/readiness';
import { idListParam, type SiteData } from '../data/site-data';
import { mapInSlices } from '../lib/in-slices';
import type { CoatEntity } from '../db/entities/coat.entity';
import type { PartEntity } from '../db/entities/part.entity';

/** What a part's coat says about its timing: the columns the readiness maths and the planner read. */
export type CoatTimes = Pick<CoatEntity, 'id' | 'spraySessionId' | 'stepPosition' | 'sprayedAt' | 'flashOffEndsAt' | 'recoatOpensAt' | 'recoatClosesAt' | 'touchDryAt' | 'handleAt' | 'packAt' | 'fullCureAt'>;

/** What a part's coat says about its step: what the calendar, the bookings and a part's site read. */
export type CoatStep = Pick<CoatEntity, 'id' | 'spraySessionId' | 'stepPosition' | 'sprayedAt' | 'recoatOpensAt' | 'recoatClosesAt'>;

// Only the columns asked for: a whole coat row is 33 values, and building thousands of them (a
// week's calendar, the ready board) cost ten times the query itself; each date column left out is
// a string fewer per row.
const stepColumns = `cp.part_id AS "partId", c.id, c.spray_session_id AS "spraySessionId", c.step_position AS "stepPosition",
         c.sprayed_at AS "sprayedAt", c.recoat_opens_at AS "recoatOpensAt", c.recoat_closes_at AS "recoatClosesAt"`;
const timeColumns = `${stepColumns}, c.flash_off_ends_at AS "flashOffEndsAt", c.touch_dry_at AS "touchDryAt",
         c.handle_at AS "handleAt", c.pack_at AS "packAt", c.full_cure_at AS "fullCureAt"`;
const currentCoatsSql = (columns: string, idList: string) => `
  SELECT ${columns}
  FROM coat_parts cp JOIN coats c ON c.id = cp.coat_id
  WHERE cp.part_id IN (${idList}) AND NOT EXISTS (SELECT 1 FROM coats n WHERE n.replaces_id = c.id)`;

async function currentCoatRows<T>(data: SiteData, partIds: number[], columns: string): Promise<Map<number, T[]>> {
  const byPart = new Map<number, T[]>(partIds.map((id) => [id, []]));
  if (partIds.length === 0) return byPart;
  const { sql } = data;
  const text = currentCoatsSql(columns, sql.idList);
  const rows = await mapInSlices(partIds, (slice) => sql.select<T & { partId: number }>(text, [idListParam(sql.dialect, slice)]));
  // Both drivers give integer columns as numbers; the row is kept as it comes (its partId too), not copied.
  for (const row of rows) byPart.get(row.partId)?.push(row);
  return byPart;
}

/**
 * Current coat versions (not yet corrected) that covered any of the parts, by part id, whichever
 * site sprayed them: a part's next step and readiness come from its whole history. Callers show
 * what follows from them only for parts their own scope sees.
 */
export function currentCoatsByPart(data: SiteData, partIds: number[]): Promise<Map<number, CoatTimes[]>> {
  return currentCoatRows<CoatTimes>(data, partIds, timeColumns);
}

/** The same coats with only what says which step they were and the window they left (see `currentCoatsByPart`). */
export function currentCoatStepsByPart(data: SiteData, partIds: number[]): Promise<Map<number, CoatStep[]>> {
  return currentCoatRows<CoatStep>(data, partIds, stepColumns);
}

/**
 * When each part was denibbed or scuffed, from the denib records the data's scope sees, by part id
 * (oldest first). For a part's readiness pass `data.acrossSites`, as for its coats.
 */
export async function denibTimesByPart(data: SiteData, partIds: number[]): Promise<Map<number, Date[]>> {
  const byPart = new Map<number, Date[]>(partIds.map((id) => [id, []]));
  if (partIds.length === 0) return byPart;
  const rows = await data.denibParts
    .select('dp')
    .innerJoin('denibs', 'd', 'd.id = dp.denib_id')
    .select('dp.part_id', 'partId')
    .addSelect('d.abraded_at', 'abradedAt')
    .where('dp.part_id IN (:...partIds)', { partIds })
    .orderBy('d.abraded_at', 'ASC')
    .getRawMany<{ partId: number | string; abradedAt: string }>();
  for (const row of rows) byPart.get(Number(row.partId))?.push(new Date(row.abradedAt));
  return byPart;
}

/** Each job's finish-system steps, in order, for the parts given. */
export async function stepsByJob(data: SiteData, parts: Pick<PartEntity, 'jobId'>[]): Promise<Map<number, FinishStep[]>> {
  const jobIds = [...new Set(parts.map((p) => p.jobId))];
  const jobs = jobIds.length ? await data.jobs.findBy({ id: In(jobIds) }) : [];
  const systemIds = [...new Set(jobs.map((j) => j.finishSystemId).filter((id): id is number => id !== null))];
  const steps = systemIds.length ? await data.finishSteps.find({ where: { finishSystemId: In(systemIds) }, order: { position: 'ASC' } }) : [];
  return new Map(
    jobs.map((job) => [
      job.id,
      steps
        .filter((s) => s.finishSystemId === job.finishSystemId)
        .map((s): FinishStep => (s.kind === 'coat' ? { kind: 'coat', productId: s.productId!, dryFilmUm: s.dryFilmUm! } : { kind: 'abrade', grit: s.grit ?? 'P320' })),
    ]),
  );
}

/**
 * A coat as the readiness maths reads it. Its instants become Dates only when read: of a part's
 * coats the maths reads the spraying time of each but the other instants of the latest one alone,
 * and a board builds tens of thousands of these.
 */
class CoatOnRecord {
  #sprayedAt?: Date;
  constructor(private readonly row: CoatTimes) {}
  get sprayedAt(): Date {
    return (this.#sprayedAt ??= new Date(this.row.sprayedAt));
  }
  get flashOffEndsAt(): Date {
    return new Date(this.row.flashOffEndsAt);
  }
  get recoatOpensAt(): Date {
    return new Date(this.row.recoatOpensAt);
  }
  get recoatClosesAt(): Date | null {
    return this.row.recoatClosesAt ? new Date(this.row.recoatClosesAt) : null;
  }
  get touchDryAt(): Date {
    return new Date(this.row.touchDryAt);
  }
  get handleAt(): Date {
    return new Date(this.row.handleAt);
  }
  get packAt(): Date {
    return new Date(this.row.packAt);
  }
  get fullCureAt(): Date {
    return new Date(this.row.fullCureAt);
  }
}

class PlannedCoatOnRecord extends CoatOnRecord {
  constructor(
    row: CoatTimes,
    readonly stepIndex: number,
  ) {
    super(row);
  }
}

/** Coats as the readiness maths reads them; coats logged outside the finish system are left out. */
export function toPartCoats(coats: CoatTimes[], steps: FinishStep[]): PartCoat[] {
  return coats.filter((c) => c.stepPosition !== null && steps[c.stepPosition]?.kind === 'coat').map((c) => new PlannedCoatOnRecord(c, c.stepPosition!));
}

/** Coats that match no coat step of the system: a part with no finish system is dried from these. */
export function unplannedPartCoats(coats: CoatTimes[], steps: FinishStep[]): NonNullable<ReadinessInput['unplannedCoats']> {
  return coats.filter((c) => c.stepPosition === null || steps[c.stepPosition]?.kind !== 'coat').map((c) => new CoatOnRecord(c));
}

/** The first coat step of the system not yet done on the part, or null when all are done. */
export function nextCoatStep(steps: FinishStep[], coats: Pick<CoatEntity, 'stepPosition'>[]): number | null {
  const done = new Set(coats.map((c) => c.stepPosition));
  const index = steps.findIndex((step, i) => step.kind === 'coat' && !done.has(i));
  return index === -1 ? null : index;
}
