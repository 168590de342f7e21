import { createCoatSchema, type Coat, type CoatQuery, type CorrectCoatInput, type CreateCoatInput } from '../../shared/schemas/coat';
import type { List } from '../../shared/schemas/common';
import { pageOf } from '../data/page-of';
import type { SiteData } from '../data/site-data';
import type { CoatEntity, StoredWarning } from '../db/entities/coat.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { assertHappenedNearNow } from '../lib/instant-window';
import { assertRunsSpraySession, type SpraySessionRunner } from './spray-session-runner';
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

/** The coat log: a site's coats are those of its booths' spray sessions. */
export function createCoatService(data: SiteData, settings: SettingsService, events: EventBus, clock: Clock = systemClock) {
  /** Writes one coat version; answers it with its site, for the change feed. */
  async function write(tx: SiteData, fields: CoatFields, version: Version, actor: SpraySessionRunner): Promise<{ coat: CoatEntity; siteId: number | null }> {
    await assertRunsSpraySession(tx, fields.spraySessionId, actor);
    const { timezone } = await settings.get();
    const { record, stepPosition, dryingTempC, siteId } = await prepareCoat(tx, fields, timezone);
    const iso = (d: Date) => d.toISOString();
    const coat = await tx.coats.save(
      tx.coats.create({
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
    await tx.coatParts.insert([...new Set(fields.partIds)].map((partId) => ({ coatId: coat.id, partId })));
    await refreshPartStates(tx, fields.partIds, actor, clock.now());
    return { coat, siteId };
  }

  async function written(tx: SiteData, fields: CoatFields, version: Version, actor: SpraySessionRunner): Promise<{ coat: Coat; siteId: number | null }> {
    const { coat, siteId } = await write(tx, fields, version, actor);
    return { coat: await dto(tx, coat), siteId };
  }

  async function dto(tx: SiteData, coat: CoatEntity): Promise<Coat> {
    return (await toCoatDtos(tx, [coat]))[0];
  }

  return {
    /** A resent coat with a known idempotency key returns the first record instead of a second one. */
    async create(input: CreateCoatInput, actor: SpraySessionRunner): Promise<{ coat: Coat; replayed: boolean }> {
      const { idempotencyKey, ...fields } = createCoatSchema.parse(input);
      // A coat with this key already recorded (a resend, however long the tablet was offline) is answered with that record.
      const replay = async () => {
        const existing = idempotencyKey ? await data.acrossSites.coats.findOneBy({ idempotencyKey }) : null;
        if (!existing) return null;
        if (!(await data.coats.existsBy({ id: existing.id }))) throw new AppError('conflict', 'This idempotency key belongs to another record', { idempotencyKey: 'Send a new key' });
        return { coat: await dto(data, existing), replayed: true };
      };
      const earlier = await replay();
      if (earlier) return earlier;
      assertHappenedNearNow(fields.sprayedAt, 'sprayedAt', clock.now());
      let made: Awaited<ReturnType<typeof written>>;
      try {
        made = await data.transaction((tx) => written(tx, fields, { replacesId: null, version: 1, correctionReason: null, idempotencyKey }, actor));
      } catch (error) {
        // The same coat resent twice at once: the database let one in and refused the other.
        const raced = await replay();
        if (raced) return raced;
        throw error;
      }
      const { coat, siteId } = made;
      events.publish({ type: 'coat.created', id: coat.id, partIds: coat.partIds, siteId });
      return { coat, replayed: false };
    },

    async correct(id: number, input: CorrectCoatInput, actor: SpraySessionRunner): Promise<Coat> {
      const { reason, ...changes } = input;
      // A correction that leaves the time alone may correct a coat of any age.
      assertHappenedNearNow(changes.sprayedAt, 'sprayedAt', clock.now());
      const { coat, siteId } = await data.transaction(async (tx) => {
        const old = await tx.coats.findOneBy({ id });
        if (!old) throw notFound('Coat record');
        const newer = await tx.acrossSites.coats.findOneBy({ replacesId: id });
        if (newer) throw new AppError('conflict', `This coat was already corrected (by ${newer.recordedByName}, version ${newer.version}); correct the newest version instead`);
        const [current] = await toCoatDtos(tx, [old]);
        const merged = createCoatSchema.parse({ ...current, acknowledgements: [], idempotencyKey: null, ...changes });
        const { idempotencyKey: _key, ...fields } = merged;
        return written(tx, fields, { replacesId: id, version: old.version + 1, correctionReason: reason, idempotencyKey: null }, actor);
      });
      events.publish({ type: 'coat.created', id: coat.id, partIds: coat.partIds, siteId });
      return coat;
    },

    async get(id: number): Promise<Coat> {
      const coat = await data.coats.findOneBy({ id });
      if (!coat) throw notFound('Coat record');
      return dto(data, coat);
    },

    async list(query: CoatQuery): Promise<List<Coat>> {
      const qb = data.coats.select('c');
      if (!query.history) qb.andWhere('NOT EXISTS (SELECT 1 FROM coats n WHERE n.replaces_id = c.id)');
      if (query.spraySessionId) qb.andWhere('c.spray_session_id = :s', { s: query.spraySessionId });
      if (query.productId) qb.andWhere('c.product_id = :p', { p: query.productId });
      if (query.partId) qb.andWhere('c.id IN (SELECT cp.coat_id FROM coat_parts cp WHERE cp.part_id = :part)', { part: query.partId });
      if (query.jobId) qb.andWhere('c.id IN (SELECT cp.coat_id FROM coat_parts cp JOIN parts pt ON pt.id = cp.part_id WHERE pt.job_id = :job)', { job: query.jobId });
      if (query.from) qb.andWhere('c.sprayed_at >= :from', { from: new Date(query.from).toISOString() });
      if (query.to) qb.andWhere('c.sprayed_at < :to', { to: new Date(query.to).toISOString() });
      qb.orderBy('c.sprayed_at', 'DESC').addOrderBy('c.id', 'DESC');
      const [rows, total] = await pageOf(qb, query.page, query.pageSize);
      return { items: await toCoatDtos(data, rows), total, page: query.page, pageSize: query.pageSize };
    },
  };
}

export type CoatService = ReturnType<typeof createCoatService>;
