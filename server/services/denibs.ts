import { In } from 'typeorm';
import type { List } from '../../shared/schemas/common';
import { createDenibSchema, type CreateDenibInput, type Denib, type DenibQuery } from '../../shared/schemas/denib';
import type { SiteData } from '../data/site-data';
import type { DenibEntity } from '../db/entities/denib.entity';
import { AppError } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { assertHappenedNearNow } from '../lib/instant-window';
import type { EventBus } from './events';
import { partsSeenBy } from './part-sites';
import { refreshPartStates } from './part-states';
import { assertRunsSpraySession, type SpraySessionRunner } from './spray-session-runner';
import { keyOfAnotherRecord, writeOnce, type Once } from './write-once';

// A tablet's clock may run a little ahead of the server's; more than this is a typing slip.
const futureSlackMs = 5 * 60_000;

type DenibFields = ReturnType<typeof createDenibSchema.parse>;

/** Denib records with their parts, built field by field. */
export async function toDenibDtos(data: SiteData, denibs: DenibEntity[]): Promise<Denib[]> {
  const ids = denibs.map((d) => d.id);
  const links = ids.length ? await data.denibParts.find({ where: { denibId: In(ids) }, order: { partId: 'ASC' } }) : [];
  return denibs.map((d) => ({
    id: d.id,
    spraySessionId: d.spraySessionId,
    partIds: links.filter((l) => l.denibId === d.id).map((l) => l.partId),
    grit: d.grit,
    abradedAt: d.abradedAt,
    notes: d.notes,
    recordedById: d.recordedById,
    recordedByName: d.recordedByName,
    recordedAt: d.recordedAt,
  }));
}

/**
 * The spray session must be one of the scope's and still stand; the parts must exist and not stand
 * on a rack of another site than the session's booth. Answers the session's site.
 */
async function checkReferences(tx: SiteData, input: ReturnType<typeof createDenibSchema.parse>, now: Date): Promise<number | null> {
  const spraySession = await tx.spraySessions.findOneBy({ id: input.spraySessionId });
  if (!spraySession) throw new AppError('validation_failed', 'That spray session does not exist', { spraySessionId: 'Choose a spray session' });
  if (spraySession.state === 'cancelled') throw new AppError('conflict', 'This spray session was cancelled; record the denib on the session that ran');
  const partIds = [...new Set(input.partIds)];
  const parts = await tx.parts.findBy({ id: In(partIds) });
  if (parts.length !== partIds.length) throw new AppError('validation_failed', 'One or more parts do not exist', { partIds: 'Choose parts that exist' });
  const booth = await tx.booths.findOneBy({ id: spraySession.boothId });
  const placed = parts.filter((p) => p.rackId !== null);
  if (booth && (await partsSeenBy(tx.forSite(booth.siteId), placed)).size !== placed.length) {
    throw new AppError('validation_failed', 'One or more parts stand on a rack of another site', { partIds: 'Choose parts at this site' });
  }
  if (Date.parse(input.abradedAt) > now.getTime() + futureSlackMs) throw new AppError('validation_failed', 'A denib cannot be recorded ahead of time', { abradedAt: 'Give when the parts were sanded, not later than now' });
  return booth?.siteId ?? null;
}

/** Denibs belong to their spray session's site, like coats: the scope records and reads its own. */
export function createDenibService(data: SiteData, events: EventBus, clock: Clock = systemClock) {
  return {
    /** Clears "denib needed" on the parts and, after a missed window, lets the next coat go on. */
    async create(input: CreateDenibInput, actor: SpraySessionRunner): Promise<Once<Denib>> {
      const fields = createDenibSchema.parse(input);
      return writeOnce(fields.idempotencyKey, earlier, () => write(fields, actor));
    },

    async list(query: DenibQuery): Promise<List<Denib>> {
      const qb = data.denibs.select('d');
      if (query.spraySessionId) qb.andWhere('d.spray_session_id = :s', { s: query.spraySessionId });
      if (query.partId) qb.andWhere('d.id IN (SELECT dp.denib_id FROM denib_parts dp WHERE dp.part_id = :part)', { part: query.partId });
      if (query.jobId) qb.andWhere('d.id IN (SELECT dp.denib_id FROM denib_parts dp JOIN parts pt ON pt.id = dp.part_id WHERE pt.job_id = :job)', { job: query.jobId });
      if (query.from) qb.andWhere('d.abraded_at >= :from', { from: new Date(query.from).toISOString() });
      if (query.to) qb.andWhere('d.abraded_at < :to', { to: new Date(query.to).toISOString() });
      qb.orderBy('d.abraded_at', 'DESC').addOrderBy('d.id', 'DESC');
      const [rows, total] = await qb.skip((query.page - 1) * query.pageSize).take(query.pageSize).getManyAndCount();
      return { items: await toDenibDtos(data, rows), total, page: query.page, pageSize: query.pageSize };
    },
  };

  async function earlier(idempotencyKey: string): Promise<Denib | null> {
    const existing = await data.acrossSites.denibs.findOneBy({ idempotencyKey });
    if (!existing) return null;
    if (!(await data.denibs.existsBy({ id: existing.id }))) throw keyOfAnotherRecord();
    return (await toDenibDtos(data, [existing]))[0];
  }

  async function write(fields: DenibFields, actor: SpraySessionRunner): Promise<Denib> {
    const now = clock.now();
    assertHappenedNearNow(fields.abradedAt, 'abradedAt', now);
    const { denib, siteId } = await data.transaction(async (tx) => {
      await assertRunsSpraySession(tx, fields.spraySessionId, actor);
      const site = await checkReferences(tx, fields, now);
      const row = await tx.denibs.save(
        tx.denibs.create({
          spraySessionId: fields.spraySessionId,
          grit: fields.grit,
          abradedAt: new Date(fields.abradedAt).toISOString(),
          notes: fields.notes,
          recordedById: actor.id,
          recordedByName: actor.name,
          recordedAt: now.toISOString(),
          idempotencyKey: fields.idempotencyKey,
        }),
      );
      await tx.denibParts.insert([...new Set(fields.partIds)].map((partId) => ({ denibId: row.id, partId })));
      await refreshPartStates(tx, fields.partIds, actor, now);
      return { denib: (await toDenibDtos(tx, [row]))[0], siteId: site };
    });
    events.publish({ type: 'denib.created', id: denib.id, partIds: denib.partIds, siteId });
    return denib;
  }
}

export type DenibService = ReturnType<typeof createDenibService>;
