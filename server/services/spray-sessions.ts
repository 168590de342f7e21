import { In, type DataSource, type EntityManager } from 'typeorm';
import type { List } from '../../shared/schemas/common';
import {
  createSpraySessionSchema,
  type CreateSpraySessionInput,
  type SpraySession,
  type SpraySessionQuery,
  type UpdateSpraySessionInput,
} from '../../shared/schemas/spray-session';
import { BoothEntity } from '../db/entities/booth.entity';
import { PartEntity } from '../db/entities/part.entity';
import { SpraySessionItemEntity } from '../db/entities/spray-session-item.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { inTransaction } from '../db/transaction';
import { AppError, notFound } from '../lib/app-error';
import { everySite, inScope, type SiteScope } from '../lib/site-scope';
import { systemClock, type Clock } from '../lib/clock';
import { recordAudit, type Actor } from './audit';
import type { EventBus } from './events';
import type { SettingsService } from './settings';
import { assertRackSpace } from './rack-space';
import { assertNoClash, assertOpen } from './spray-session-rules';
import { assertSprayerFor } from './sprayers';
import { toSpraySessionDtos } from './spray-session-dto';
import { changeState, recordChecklist, type SessionActor } from './spray-session-progress';

async function writeItems(manager: EntityManager, sessionId: number, items: { partId: number; stepPosition: number | null }[]): Promise<void> {
  const partIds = [...new Set(items.map((i) => i.partId))];
  if (partIds.length && (await manager.countBy(PartEntity, { id: In(partIds) })) !== partIds.length) {
    throw new AppError('validation_failed', 'A planned part does not exist', { items: 'Choose parts that exist' });
  }
  await manager.delete(SpraySessionItemEntity, { spraySessionId: sessionId });
  if (items.length) await manager.insert(SpraySessionItemEntity, items.map((i) => ({ spraySessionId: sessionId, partId: i.partId, stepPosition: i.stepPosition })));
}

type SessionFields = ReturnType<typeof createSpraySessionSchema.parse>;

/** A booth of another site is, to a lead, a booth that does not exist. */
async function boothOrFail(manager: EntityManager, boothId: number, scope: SiteScope): Promise<BoothEntity> {
  const booth = await manager.findOneBy(BoothEntity, { id: boothId });
  if (!booth || !inScope(scope, booth.siteId)) throw new AppError('validation_failed', 'That booth does not exist', { boothId: 'Choose a booth' });
  return booth;
}

async function insertSession(manager: EntityManager, fields: SessionFields, actor: Actor, timezone: string, now: string, scope: SiteScope): Promise<SpraySessionEntity> {
  const slot = { boothId: fields.boothId, startAt: new Date(fields.start).toISOString(), endAt: new Date(fields.end).toISOString(), sprayerId: fields.sprayerId };
  const booth = await boothOrFail(manager, fields.boothId, scope);
  await assertSprayerFor(manager, fields.sprayerId, booth);
  assertOpen(slot, booth, timezone, fields.override?.reason ?? null);
  await assertNoClash(manager, slot, booth, timezone);
  await assertRackSpace(manager, fields.items.map((i) => i.partId), new Date(now), fields.override?.reason ?? null);
  const session = await manager.save(
    manager.create(SpraySessionEntity, { ...slot, state: 'planned', notes: fields.notes, checklist: null, overrideReason: fields.override?.reason ?? null, sprayingStartedAt: null, clearingStartedAt: null, createdAt: now, updatedAt: now }),
  );
  await writeItems(manager, session.id, fields.items);
  const summary = `Booked ${booth.name} ${slot.startAt}–${slot.endAt}${fields.override ? ` (override: ${fields.override.reason})` : ''}`;
  await recordAudit(manager, actor, { action: 'create', entity: 'spray-session', entityId: session.id, summary }, new Date(now));
  return session;
}

export function createSpraySessionService(dataSource: DataSource, settings: SettingsService, events: EventBus, clock: Clock = systemClock) {
  async function sessionOrFail(manager: EntityManager, id: number, scope: SiteScope): Promise<SpraySessionEntity> {
    const session = await manager.findOneBy(SpraySessionEntity, { id });
    const booth = session && (await manager.findOneBy(BoothEntity, { id: session.boothId }));
    if (!session || !booth || !inScope(scope, booth.siteId)) throw notFound('Spray session');
    return session;
  }

  const workContext = async () => ({ planningTempC: (await settings.get()).planningDryingTempC, now: clock.now() });
  const toDtos = async (sessions: SpraySessionEntity[]) => toSpraySessionDtos(dataSource.manager, sessions, await workContext());

  async function getWith(manager: EntityManager, id: number, scope: SiteScope = everySite): Promise<SpraySession> {
    return (await toDtos([await sessionOrFail(manager, id, scope)]))[0];
  }

  return {
    async list(query: SpraySessionQuery, scope: SiteScope = everySite): Promise<List<SpraySession>> {
      const qb = dataSource.getRepository(SpraySessionEntity).createQueryBuilder('s');
      if (scope.siteId !== null) qb.andWhere('s.booth_id IN (SELECT b.id FROM booths b WHERE b.site_id = :siteId)', { siteId: scope.siteId });
      // The time window as a subquery, so SQLite finds this week's sessions through the end_at index;
      // next to the ORDER BY it would walk the start_at index through every earlier session instead.
      const window = [...(query.from ? ['w.end_at > :from'] : []), ...(query.to ? ['w.start_at < :to'] : [])];
      if (window.length) {
        const bounds = { ...(query.from ? { from: new Date(query.from).toISOString() } : {}), ...(query.to ? { to: new Date(query.to).toISOString() } : {}) };
        qb.andWhere(`s.id IN (SELECT w.id FROM spray_sessions w WHERE ${window.join(' AND ')})`, bounds);
      }
      if (query.boothId) qb.andWhere('s.booth_id = :boothId', { boothId: query.boothId });
      qb.orderBy('s.start_at', 'ASC').addOrderBy('s.id', 'ASC');
      const [rows, total] = await qb.skip((query.page - 1) * query.pageSize).take(query.pageSize).getManyAndCount();
      return { items: await toDtos(rows), total, page: query.page, pageSize: query.pageSize };
    },

    get: (id: number, scope: SiteScope = everySite) => getWith(dataSource.manager, id, scope),

    async create(input: CreateSpraySessionInput, actor: Actor, scope: SiteScope = everySite): Promise<SpraySession> {
      const fields = createSpraySessionSchema.parse(input);
      const { timezone } = await settings.get();
      const session = await inTransaction(dataSource, (manager) => insertSession(manager, fields, actor, timezone, clock.now().toISOString(), scope));
      const [created] = await toDtos([session]);
      events.publish({ type: 'spray-session.changed', id: created.id });
      return created;
    },

    /** Books every session of an accepted plan, or none of them. */
    async createAll(inputs: CreateSpraySessionInput[], actor: Actor, scope: SiteScope = everySite): Promise<SpraySession[]> {
      const all = inputs.map((input) => createSpraySessionSchema.parse(input));
      const { timezone } = await settings.get();
      const sessions = await inTransaction(dataSource, async (manager) => {
        const booked: SpraySessionEntity[] = [];
        for (const fields of all) booked.push(await insertSession(manager, fields, actor, timezone, clock.now().toISOString(), scope));
        return booked;
      });
      const created = await toDtos(sessions);
      for (const session of created) events.publish({ type: 'spray-session.changed', id: session.id });
      return created;
    },

    async update(id: number, patch: UpdateSpraySessionInput, actor: SessionActor, scope: SiteScope = everySite): Promise<SpraySession> {
      const { timezone } = await settings.get();
      const now = clock.now().toISOString();
      const saved = await inTransaction(dataSource, async (manager) => {
        const session = await sessionOrFail(manager, id, scope);
        const slot = {
          id,
          boothId: patch.boothId ?? session.boothId,
          startAt: patch.start ? new Date(patch.start).toISOString() : session.startAt,
          endAt: patch.end ? new Date(patch.end).toISOString() : session.endAt,
          sprayerId: patch.sprayerId === undefined ? session.sprayerId : patch.sprayerId,
        };
        if (Date.parse(slot.endAt) <= Date.parse(slot.startAt)) throw new AppError('validation_failed', 'The end must be after the start', { end: 'The end must be after the start' });
        const booth = await boothOrFail(manager, slot.boothId, scope);
        const retimed = slot.boothId !== session.boothId || slot.startAt !== session.startAt || slot.endAt !== session.endAt;
        const moved = retimed || slot.sprayerId !== session.sprayerId;
        if (moved) await assertSprayerFor(manager, slot.sprayerId, booth);
        // Giving a session to someone else leaves its hours alone: a booking already made outside them stands.
        if (retimed) assertOpen(slot, booth, timezone, patch.override?.reason ?? null);
        if ((moved || patch.state === 'planned') && (patch.state ?? session.state) !== 'cancelled') await assertNoClash(manager, slot, booth, timezone);
        Object.assign(session, { ...slot, notes: patch.notes ?? session.notes, updatedAt: now });
        if (patch.override) session.overrideReason = patch.override.reason;
        if (patch.checklist) session.checklist = await recordChecklist(manager, session, booth, patch.checklist, actor);
        if (patch.state && patch.state !== session.state) changeState(session, patch.state, now);
        await manager.save(session);
        if (patch.items) await writeItems(manager, id, patch.items);
        const summary = `Changed spray session ${id} on ${booth.name}${patch.state ? ` (now ${patch.state})` : ''}`;
        await recordAudit(manager, actor, { action: 'update', entity: 'spray-session', entityId: id, summary, changes: { ...patch } }, new Date(now));
        return session;
      });
      const [updated] = await toDtos([saved]);
      events.publish({ type: 'spray-session.changed', id });
      return updated;
    },
  };
}

export type SpraySessionService = ReturnType<typeof createSpraySessionService>;
