import type { DataSource, EntityManager } from 'typeorm';
import { createCoatSchema, type Coat, type CoatQuery, type CorrectCoatInput, type CreateCoatInput } from '../../shared/schemas/coat';
import type { List } from '../../shared/schemas/common';
import { CoatPartEntity } from '../db/entities/coat-part.entity';
import { CoatEntity, type StoredWarning } from '../db/entities/coat.entity';
import { inTransaction } from '../db/transaction';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { assertRunsSession, type SessionRunner } from './session-runner';
import { toCoatDtos } from './coat-dto';
import { prepareCoat, type CoatFields } from './coat-inputs';
import type { EventBus } from './events';
import { refreshPartStates } from './part-states';
import type { SettingsService } from './settings';

interface Version {
  replacesId: number | null;
  version: number;
  correctionReason: string | null;
  idempotencyKey: string | null;
}

function withAcknowledgements(warnings: StoredWarning[], fields: CoatFields): StoredWarning[] {
  const reasons = new Map(fields.acknowledgements.map((a) => [a.code, a.reason]));
  return warnings.map((w) => ({ code: w.code, message: w.message, acknowledgedReason: reasons.get(w.code) ?? null }));
}

export function createCoatService(dataSource: DataSource, settings: SettingsService, events: EventBus, clock: Clock = systemClock) {
  async function write(manager: EntityManager, fields: CoatFields, version: Version, actor: SessionRunner): Promise<CoatEntity> {
    await assertRunsSession(manager, fields.spraySessionId, actor);
    const { timezone } = await settings.get();
    const { record, stepPosition, dryingTempC } = await prepareCoat(manager, fields, timezone);
    const iso = (d: Date) => d.toISOString();
    const coat = await manager.save(
      manager.create(CoatEntity, {
        spraySessionId: fields.spraySessionId,
        productId: fields.productId,
        lotId: fields.lotId,
        mixId: fields.mixId,
        stepPosition,
        sprayedAt: iso(new Date(fields.sprayedAt)),
        airTempC: fields.airTempC,
        relativeHumidityPct: fields.relativeHumidityPct,
        surfaceTempC: fields.surfaceTempC,
        dewPointC: record.dewPointC,
        thinningPct: fields.thinningPct,
        wetFilmUm: fields.wetFilmUm,
        dryFilmUm: record.dryFilmUm,
        dryingTempC,
        dryingMethod: record.dryingMethod,
        flashOffEndsAt: iso(record.flashOffEndsAt),
        recoatOpensAt: iso(record.recoatOpensAt),
        recoatClosesAt: record.recoatClosesAt ? iso(record.recoatClosesAt) : null,
        touchDryAt: iso(record.touchDryAt),
        handleAt: iso(record.handleAt),
        packAt: iso(record.packAt),
        fullCureAt: iso(record.fullCureAt),
        warnings: withAcknowledgements(record.warnings, fields),
        notes: fields.notes,
        reworkReason: fields.reworkReason,
        recordedById: actor.id,
        recordedByName: actor.name,
        recordedAt: iso(clock.now()),
        ...version,
      }),
    );
    await manager.insert(CoatPartEntity, [...new Set(fields.partIds)].map((partId) => ({ coatId: coat.id, partId })));
    await refreshPartStates(manager, fields.partIds, actor, clock.now());
    return coat;
  }

  async function dto(manager: EntityManager, coat: CoatEntity): Promise<Coat> {
    return (await toCoatDtos(manager, [coat]))[0];
  }

  return {
    /** A resent coat with a known idempotency key returns the first record instead of a second one. */
    async create(input: CreateCoatInput, actor: SessionRunner): Promise<{ coat: Coat; replayed: boolean }> {
      const { idempotencyKey, ...fields } = createCoatSchema.parse(input);
      if (idempotencyKey) {
        const existing = await dataSource.getRepository(CoatEntity).findOneBy({ idempotencyKey });
        if (existing) return { coat: await dto(dataSource.manager, existing), replayed: true };
      }
      const coat = await inTransaction(dataSource, async (manager) => dto(manager, await write(manager, fields, { replacesId: null, version: 1, correctionReason: null, idempotencyKey }, actor)));
      events.publish({ type: 'coat.created', id: coat.id, partIds: coat.partIds });
      return { coat, replayed: false };
    },

    async correct(id: number, input: CorrectCoatInput, actor: SessionRunner): Promise<Coat> {
      const { reason, ...changes } = input;
      const coat = await inTransaction(dataSource, async (manager) => {
        const old = await manager.findOneBy(CoatEntity, { id });
        if (!old) throw notFound('Coat record');
        const newer = await manager.findOneBy(CoatEntity, { replacesId: id });
        if (newer) throw new AppError('conflict', `Coat record ${id} was already corrected by record ${newer.id}; correct that one`);
        const [current] = await toCoatDtos(manager, [old]);
        const merged = createCoatSchema.parse({ ...current, acknowledgements: [], idempotencyKey: null, ...changes });
        const { idempotencyKey: _key, ...fields } = merged;
        return dto(manager, await write(manager, fields, { replacesId: id, version: old.version + 1, correctionReason: reason, idempotencyKey: null }, actor));
      });
      events.publish({ type: 'coat.created', id: coat.id, partIds: coat.partIds });
      return coat;
    },

    async get(id: number): Promise<Coat> {
      const coat = await dataSource.getRepository(CoatEntity).findOneBy({ id });
      if (!coat) throw notFound('Coat record');
      return dto(dataSource.manager, coat);
    },

    async list(query: CoatQuery): Promise<List<Coat>> {
      const qb = dataSource.getRepository(CoatEntity).createQueryBuilder('c');
      if (!query.history) qb.leftJoin(CoatEntity, 'n', 'n.replaces_id = c.id').andWhere('n.id IS NULL');
      if (query.spraySessionId) qb.andWhere('c.spray_session_id = :s', { s: query.spraySessionId });
      if (query.productId) qb.andWhere('c.product_id = :p', { p: query.productId });
      if (query.partId) qb.andWhere('c.id IN (SELECT cp.coat_id FROM coat_parts cp WHERE cp.part_id = :part)', { part: query.partId });
      if (query.jobId) qb.andWhere('c.id IN (SELECT cp.coat_id FROM coat_parts cp JOIN parts pt ON pt.id = cp.part_id WHERE pt.job_id = :job)', { job: query.jobId });
      if (query.from) qb.andWhere('c.sprayed_at >= :from', { from: new Date(query.from).toISOString() });
      if (query.to) qb.andWhere('c.sprayed_at < :to', { to: new Date(query.to).toISOString() });
      qb.orderBy('c.sprayed_at', 'DESC').addOrderBy('c.id', 'DESC');
      const [rows, total] = await qb.skip((query.page - 1) * query.pageSize).take(query.pageSize).getManyAndCount();
      return { items: await toCoatDtos(dataSource.manager, rows), total, page: query.page, pageSize: query.pageSize };
    },
  };
}

export type CoatService = ReturnType<typeof createCoatService>;
