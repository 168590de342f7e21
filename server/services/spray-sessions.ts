import { In } from 'typeorm';
import type { List } from '../../shared/schemas/common';
import {
  createSpraySessionSchema,
  type CreateSpraySessionInput,
  type SpraySession,
  type SpraySessionQuery,
  type UpdateSpraySessionInput,
} from '../../shared/schemas/spray-session';
import type { SiteData } from '../data/site-data';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { recordAudit, type Actor } from './audit';
import type { EventBus } from './events';
import { partsSeenBy } from './part-sites';
import { assertRackSpace } from './rack-space';
import type { SettingsService } from './settings';
import { changeState, recordChecklist, type SpraySessionActor } from './spray-session-progress';
import { toSpraySessionDtos } from './spray-session-dto';
import { assertNoClash, assertOpen } from './spray-session-rules';
import { shopFormatOf, shopSpanWords, spraySessionWords, type ShopFormat } from '../../shared/words';
import { assertSprayerFor } from './sprayers';
import { earlierReply, keepReply } from './spray-session-replies';
import { writeOnce } from './write-once';
import { assertHappenedNearNow } from '../lib/instant-window';

/** Planned parts must exist, and a part placed at another site is not the booth's site's to plan. */
async function writeItems(tx: SiteData, booth: BoothEntity, spraySessionId: number, items: { partId: number; stepPosition: number | null }[]): Promise<void> {
  const partIds = [...new Set(items.map((i) => i.partId))];
  const parts = partIds.length ? await tx.parts.findBy({ id: In(partIds) }) : [];
  if (parts.length !== partIds.length || (await partsSeenBy(tx.forSite(booth.siteId), parts)).size !== partIds.length) {
    throw new AppError('validation_failed', 'A planned part does not exist or is at another site', { items: 'Choose parts that exist at this site' });
  }
  await tx.spraySessionItems.delete({ spraySessionId });
  await tx.spraySessionItems.insert(items.map((i) => ({ spraySessionId, partId: i.partId, stepPosition: i.stepPosition })));
}

type SpraySessionFields = ReturnType<typeof createSpraySessionSchema.parse>;

// What a sprayer may change on a session assigned to them: its progress, not its booking.
const runnerFields = new Set(['state', 'notes', 'checklist', 'changedAt', 'idempotencyKey']);

/** Anyone who may not book (a sprayer) moves only their own sessions through their steps. */
function assertRunnerMayChange(spraySession: SpraySessionEntity, patch: UpdateSpraySessionInput, actor: SpraySessionActor): void {
  if (actor.mayOverride) return;
  const onlyProgress = Object.keys(patch).every((key) => runnerFields.has(key));
  if (spraySession.sprayerId !== actor.id || !onlyProgress) throw new AppError('forbidden', 'Sprayers may only move their own sessions through their steps; ask the finishing lead to rebook');
}

/** A booth of another site is, to a lead, a booth that does not exist. */
async function boothOrFail(tx: SiteData, boothId: number): Promise<BoothEntity> {
  const booth = await tx.booths.findOneBy({ id: boothId });
  if (!booth) throw new AppError('validation_failed', 'That booth does not exist', { boothId: 'Choose a booth' });
  return booth;
}

async function insertSpraySession(tx: SiteData, fields: SpraySessionFields, actor: Actor, shop: ShopFormat, now: string): Promise<{ spraySession: SpraySessionEntity; siteId: number }> {
  const timezone = shop.timeZone;
  const slot = { boothId: fields.boothId, startAt: new Date(fields.start).toISOString(), endAt: new Date(fields.end).toISOString(), sprayerId: fields.sprayerId };
  const booth = await boothOrFail(tx, fields.boothId);
  await assertSprayerFor(tx, fields.sprayerId, booth);
  assertOpen(slot, booth, timezone, fields.override?.reason ?? null);
  await assertNoClash(tx, slot, booth, shop);
  await assertRackSpace(tx.forSite(booth.siteId), fields.items.map((i) => i.partId), new Date(now), fields.override?.reason ?? null);
  const spraySession = await tx.spraySessions.save(
    tx.spraySessions.create({ ...slot, state: 'planned', notes: fields.notes, checklist: null, overrideReason: fields.override?.reason ?? null, sprayingStartedAt: null, clearingStartedAt: null, createdAt: now, updatedAt: now }),
  );
  await writeItems(tx, booth, spraySession.id, fields.items);
  const summary = `Booked ${booth.name} ${shopSpanWords(new Date(slot.startAt), new Date(slot.endAt), shop)}${fields.override ? ` (override: ${fields.override.reason})` : ''}`;
  await recordAudit(tx, actor, { action: 'create', entity: 'spray-session', entityId: spraySession.id, summary, siteId: booth.siteId }, new Date(now));
  return { spraySession, siteId: booth.siteId };
}

export function createSpraySessionService(data: SiteData, settings: SettingsService, events: EventBus, clock: Clock = systemClock) {
  async function spraySessionOrFail(tx: SiteData, id: number): Promise<SpraySessionEntity> {
    const spraySession = await tx.spraySessions.findOneBy({ id });
    if (!spraySession) throw notFound('Spray session');
    return spraySession;
  }

  /** Sessions as the API sends them, with what each sprays and what is sprayed already. */
  async function toDtos(tx: SiteData, spraySessions: SpraySessionEntity[]): Promise<SpraySession[]> {
    return toSpraySessionDtos(tx, spraySessions, { planningTempC: (await settings.get()).planningDryingTempC, now: clock.now() });
  }

  async function getWith(tx: SiteData, id: number): Promise<SpraySession> {
    return (await toDtos(tx, [await spraySessionOrFail(tx, id)]))[0];
  }

  return {
    async list(query: SpraySessionQuery): Promise<List<SpraySession>> {
      const qb = data.spraySessions.select('s');
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
      return { items: await toDtos(data, rows), total, page: query.page, pageSize: query.pageSize };
    },

    get: (id: number) => getWith(data, id),

    async create(input: CreateSpraySessionInput, actor: Actor): Promise<SpraySession> {
      const fields = createSpraySessionSchema.parse(input);
      const shop = shopFormatOf(await settings.get());
      const { created, siteId } = await data.transaction(async (tx) => {
        const inserted = await insertSpraySession(tx, fields, actor, shop, clock.now().toISOString());
        return { created: await getWith(tx, inserted.spraySession.id), siteId: inserted.siteId };
      });
      events.publish({ type: 'spray-session.changed', id: created.id, siteId });
      return created;
    },

    /** Books every session of an accepted plan, or none of them. */
    async createAll(inputs: CreateSpraySessionInput[], actor: Actor): Promise<SpraySession[]> {
      const all = inputs.map((input) => createSpraySessionSchema.parse(input));
      const shop = shopFormatOf(await settings.get());
      const inserted = await data.transaction(async (tx) => {
        const rows: { spraySession: SpraySessionEntity; siteId: number }[] = [];
        for (const fields of all) rows.push(await insertSpraySession(tx, fields, actor, shop, clock.now().toISOString()));
        return { dtos: await toDtos(tx, rows.map((r) => r.spraySession)), siteIds: rows.map((r) => r.siteId) };
      });
      inserted.dtos.forEach((spraySession, i) => events.publish({ type: 'spray-session.changed', id: spraySession.id, siteId: inserted.siteIds[i] }));
      return inserted.dtos;
    },

    /** A change resent with its idempotency key (a tablet back online) answers as it did the first time. */
    update: async (id: number, patch: UpdateSpraySessionInput, actor: SpraySessionActor) =>
      (await writeOnce(patch.idempotencyKey, (key) => earlierReply(data, id, key), () => update(id, patch, actor))).result,
  };

  async function update(id: number, patch: UpdateSpraySessionInput, actor: SpraySessionActor): Promise<SpraySession> {
    const shop = await settings.get();
    const { timezone } = shop;
    const now = clock.now().toISOString();
    // Checks and state changes sent later by a tablet that was offline happened when it says.
    assertHappenedNearNow(patch.changedAt, 'changedAt', clock.now());
    const at = patch.changedAt ? new Date(patch.changedAt) : clock.now();
    const updated = await data.transaction(async (tx) => {
      const spraySession = await spraySessionOrFail(tx, id);
      assertRunnerMayChange(spraySession, patch, actor);
      const slot = {
        id,
        boothId: patch.boothId ?? spraySession.boothId,
        startAt: patch.start ? new Date(patch.start).toISOString() : spraySession.startAt,
        endAt: patch.end ? new Date(patch.end).toISOString() : spraySession.endAt,
        sprayerId: patch.sprayerId === undefined ? spraySession.sprayerId : patch.sprayerId,
      };
      if (Date.parse(slot.endAt) <= Date.parse(slot.startAt)) throw new AppError('validation_failed', 'The end must be after the start', { end: 'The end must be after the start' });
      const booth = await boothOrFail(tx, slot.boothId);
      const retimed = slot.boothId !== spraySession.boothId || slot.startAt !== spraySession.startAt || slot.endAt !== spraySession.endAt;
      const moved = retimed || slot.sprayerId !== spraySession.sprayerId;
      if (moved) await assertSprayerFor(tx, slot.sprayerId, booth);
      // Giving a session to someone else leaves its hours alone: a booking already made outside them stands.
      if (retimed) assertOpen(slot, booth, timezone, patch.override?.reason ?? null);
      if ((moved || patch.state === 'planned') && (patch.state ?? spraySession.state) !== 'cancelled') await assertNoClash(tx, slot, booth, shopFormatOf(shop));
      Object.assign(spraySession, { ...slot, notes: patch.notes ?? spraySession.notes, updatedAt: now });
      if (patch.override) spraySession.overrideReason = patch.override.reason;
      if (patch.checklist) spraySession.checklist = await recordChecklist(tx, spraySession, booth, patch.checklist, actor, shop, at);
      if (patch.state && patch.state !== spraySession.state) changeState(spraySession, patch.state, at.toISOString());
      await tx.spraySessions.save(spraySession);
      if (patch.items) await writeItems(tx, booth, id, patch.items);
      const summary = `Changed the spray session ${spraySessionWords({ boothName: booth.name, startAt: new Date(spraySession.startAt) }, shopFormatOf(shop))}${patch.state ? ` (now ${patch.state})` : ''}`;
      await recordAudit(tx, actor, { action: 'update', entity: 'spray-session', entityId: id, summary, changes: { ...patch }, siteId: booth.siteId }, new Date(now));
      const dto = await getWith(tx, id);
      if (patch.idempotencyKey) await keepReply(tx, patch.idempotencyKey, dto, now);
      return { dto, siteId: booth.siteId };
    });
    events.publish({ type: 'spray-session.changed', id, siteId: updated.siteId });
    return updated.dto;
  }
}

export type SpraySessionService = ReturnType<typeof createSpraySessionService>;
