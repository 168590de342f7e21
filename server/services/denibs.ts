import { In, type DataSource, type EntityManager } from 'typeorm';
import type { List } from '../../shared/schemas/common';
import { createDenibSchema, type CreateDenibInput, type Denib, type DenibQuery } from '../../shared/schemas/denib';
import { DenibEntity, DenibPartEntity } from '../db/entities/denib.entity';
import { PartEntity } from '../db/entities/part.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { inTransaction } from '../db/transaction';
import { AppError } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import type { EventBus } from './events';
import { refreshPartStates } from './part-states';
import { assertRunsSession, type SessionRunner } from './session-runner';

// A tablet's clock may run a little ahead of the server's; more than this is a typing slip.
const futureSlackMs = 5 * 60_000;

/** Denib records with their parts, built field by field. */
export async function toDenibDtos(manager: EntityManager, denibs: DenibEntity[]): Promise<Denib[]> {
  const ids = denibs.map((d) => d.id);
  const links = ids.length ? await manager.find(DenibPartEntity, { where: { denibId: In(ids) }, order: { partId: 'ASC' } }) : [];
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

async function checkReferences(manager: EntityManager, input: ReturnType<typeof createDenibSchema.parse>, now: Date): Promise<void> {
  const session = await manager.findOneBy(SpraySessionEntity, { id: input.spraySessionId });
  if (!session) throw new AppError('validation_failed', 'That spray session does not exist', { spraySessionId: 'Choose a spray session' });
  if (session.state === 'cancelled') throw new AppError('conflict', `Spray session ${session.id} was cancelled; record the denib on the session that ran`);
  const partIds = [...new Set(input.partIds)];
  if ((await manager.countBy(PartEntity, { id: In(partIds) })) !== partIds.length) throw new AppError('validation_failed', 'One or more parts do not exist', { partIds: 'Choose parts that exist' });
  if (Date.parse(input.abradedAt) > now.getTime() + futureSlackMs) throw new AppError('validation_failed', 'A denib cannot be recorded ahead of time', { abradedAt: 'Give when the parts were sanded, not later than now' });
}

export function createDenibService(dataSource: DataSource, events: EventBus, clock: Clock = systemClock) {
  return {
    /** Clears "denib needed" on the parts and, after a missed window, lets the next coat go on. */
    async create(input: CreateDenibInput, actor: SessionRunner): Promise<Denib> {
      const fields = createDenibSchema.parse(input);
      const now = clock.now();
      const denib = await inTransaction(dataSource, async (manager) => {
        await assertRunsSession(manager, fields.spraySessionId, actor);
        await checkReferences(manager, fields, now);
        const row = await manager.save(
          manager.create(DenibEntity, {
            spraySessionId: fields.spraySessionId,
            grit: fields.grit,
            abradedAt: new Date(fields.abradedAt).toISOString(),
            notes: fields.notes,
            recordedById: actor.id,
            recordedByName: actor.name,
            recordedAt: now.toISOString(),
          }),
        );
        await manager.insert(DenibPartEntity, [...new Set(fields.partIds)].map((partId) => ({ denibId: row.id, partId })));
        await refreshPartStates(manager, fields.partIds, actor, now);
        return (await toDenibDtos(manager, [row]))[0];
      });
      events.publish({ type: 'denib.created', id: denib.id, partIds: denib.partIds });
      return denib;
    },

    async list(query: DenibQuery): Promise<List<Denib>> {
      const qb = dataSource.getRepository(DenibEntity).createQueryBuilder('d');
      if (query.spraySessionId) qb.andWhere('d.spray_session_id = :s', { s: query.spraySessionId });
      if (query.partId) qb.andWhere('d.id IN (SELECT dp.denib_id FROM denib_parts dp WHERE dp.part_id = :part)', { part: query.partId });
      if (query.jobId) qb.andWhere('d.id IN (SELECT dp.denib_id FROM denib_parts dp JOIN parts pt ON pt.id = dp.part_id WHERE pt.job_id = :job)', { job: query.jobId });
      if (query.from) qb.andWhere('d.abraded_at >= :from', { from: new Date(query.from).toISOString() });
      if (query.to) qb.andWhere('d.abraded_at < :to', { to: new Date(query.to).toISOString() });
      qb.orderBy('d.abraded_at', 'DESC').addOrderBy('d.id', 'DESC');
      const [rows, total] = await qb.skip((query.page - 1) * query.pageSize).take(query.pageSize).getManyAndCount();
      return { items: await toDenibDtos(dataSource.manager, rows), total, page: query.page, pageSize: query.pageSize };
    },
  };
}

export type DenibService = ReturnType<typeof createDenibService>;
