import { In } from 'typeorm';
import type { SpraySession } from '../../shared/schemas/spray-session';
import type { SiteData } from '../data/site-data';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { sessionsWork, type WorkContext } from './spray-session-work';
import { sprayedOffPlanOf, unplannedOf } from './sprayed-unplanned';

/** Sessions as the API sends them, field by field, with what each sprays and what is sprayed already. */
export async function toSpraySessionDtos(data: SiteData, sessions: SpraySessionEntity[], context: WorkContext): Promise<SpraySession[]> {
  const ids = sessions.map((s) => s.id);
  const boothIds = [...new Set(sessions.map((s) => s.boothId))];
  const userIds = [...new Set(sessions.map((s) => s.sprayerId).filter((id): id is number => id !== null))];
  const [items, booths, users, sprayed] = await Promise.all([
    ids.length ? data.spraySessionItems.find({ where: { spraySessionId: In(ids) }, order: { id: 'ASC' } }) : [],
    boothIds.length ? data.booths.find({ where: { id: In(boothIds) }, select: { id: true, name: true } }) : [],
    userIds.length ? data.users.find({ where: { id: In(userIds) }, select: { id: true, name: true } }) : [],
    sprayedOffPlanOf(data, ids),
  ]);
  const boothName = new Map(booths.map((b) => [b.id, b.name]));
  const userName = new Map(users.map((u) => [u.id, u.name]));
  const work = await sessionsWork(data, sessions, items, context, unplannedOf(sprayed, items));
  return sessions.map((s) => ({
    id: s.id,
    boothId: s.boothId,
    boothName: boothName.get(s.boothId) ?? '',
    start: s.startAt,
    end: s.endAt,
    sprayerId: s.sprayerId,
    sprayerName: s.sprayerId === null ? null : (userName.get(s.sprayerId) ?? null),
    state: s.state,
    notes: s.notes,
    items: work.get(s.id)!.items,
    overrideReason: s.overrideReason,
    checklist: s.checklist,
    clearingStartedAt: s.clearingStartedAt,
    work: work.get(s.id)!.work,
    createdAt: s.createdAt,
    updatedAt: s.updatedAt,
  }));
}
