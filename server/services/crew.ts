import { In } from 'typeorm';
import { recordStatus } from '../../shared/finishing/fitness';
import { nextDueDate, worseStatus, type DueStatus } from '../../shared/finishing/upkeep-due';
import type { SignedInUser } from '../../shared/schemas/auth';
import { createCrewRecordSchema, type CreateCrewRecordInput, type CrewDetail, type CrewRecord, type CrewStatus } from '../../shared/schemas/crew';
import type { ShopSettings } from '../../shared/schemas/settings';
import type { SiteData } from '../data/site-data';
import type { CrewRecordEntity } from '../db/entities/crew-record.entity';
import type { UserEntity } from '../db/entities/user.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { recordAudit, type Actor } from './audit';
import type { SettingsService } from './settings';
import { crewRecordsOf, latestCrewRecords, shopDay, type LatestCrewRecords } from './upkeep-facts';

function toCrewRecordDto(r: CrewRecordEntity): CrewRecord {
  const { id, userId, kind, doneOn, nextDueOn, respiratorModel, result, title, notes, recordedByName, recordedAt } = r;
  return { id, userId, kind, doneOn, nextDueOn, respiratorModel, result, title, notes, recordedByName, recordedAt };
}

const dated = (r: CrewRecordEntity | null) => r && { nextDueOn: r.nextDueOn, passed: r.result !== 'fail' };

/** The status of each kind of record, and nothing else: what a lead may see. */
export function crewStatusOf(user: UserEntity, latest: LatestCrewRecords, today: string, dueSoonDays: number): CrewStatus {
  const training = latest.trainings.reduce<DueStatus>((worst, t) => worseStatus(worst, recordStatus(dated(t), today, dueSoonDays)), latest.trainings.length ? 'valid' : 'none');
  return {
    userId: user.id,
    name: user.name,
    role: user.role,
    siteId: user.siteId,
    fitTest: recordStatus(dated(latest.fitTest), today, dueSoonDays),
    healthSurveillance: recordStatus(dated(latest.surveillance), today, dueSoonDays),
    training,
  };
}

const intervalOf = (kind: CrewRecord['kind'], shop: ShopSettings): number | null =>
  kind === 'fit-test' ? shop.fitTestMonths : kind === 'health-surveillance' ? shop.healthSurveillanceMonths : null;

/**
 * Crew protection records: face-fit tests, health surveillance for isocyanate work and training.
 * Health and personal records: the admin records them and reads everyone's; each person reads
 * their own; a lead sees only each person's status (valid, due soon, lapsed).
 */
export function createCrewService(data: SiteData, settings: SettingsService, clock: Clock = systemClock) {
  async function person(userId: number): Promise<UserEntity> {
    const user = await data.users.findOneBy({ id: userId });
    if (!user) throw notFound('Person');
    return user;
  }

  async function today(): Promise<{ today: string; shop: ShopSettings }> {
    const shop = await settings.get();
    return { today: shopDay(clock.now(), shop), shop };
  }

  return {
    /** The person's own records, or anyone's for an admin. */
    async detail(userId: number, viewer: Pick<SignedInUser, 'id' | 'role'>): Promise<CrewDetail> {
      if (viewer.id !== userId && viewer.role !== 'admin') throw new AppError('forbidden', 'Only the person themself and the owner see these records; a lead sees their status on the crew list');
      const user = await person(userId);
      const rows = await data.crewRecords.find({ where: { userId }, order: { doneOn: 'DESC', id: 'DESC' } });
      const { today: day, shop } = await today();
      return { status: crewStatusOf(user, latestCrewRecords(rows), day, shop.upkeepDueSoonDays), records: rows.map(toCrewRecordDto) };
    },

    /** Everyone who sprays (sprayers and leads) and anyone with a record: statuses only. */
    async statuses(): Promise<CrewStatus[]> {
      const holders = new Set((await data.crewRecords.select('r').select('r.user_id', 'userId').distinct(true).getRawMany<{ userId: number }>()).map((r) => Number(r.userId)));
      const users = await data.users.find({ where: [{ role: In(['sprayer', 'lead']), disabled: false }, ...(holders.size ? [{ id: In([...holders]), disabled: false }] : [])], order: { name: 'ASC', id: 'ASC' } });
      const latest = await crewRecordsOf(data, users.map((u) => u.id));
      const { today: day, shop } = await today();
      return users.map((u) => crewStatusOf(u, latest.get(u.id)!, day, shop.upkeepDueSoonDays));
    },

    async record(userId: number, input: CreateCrewRecordInput, actor: Actor): Promise<CrewRecord> {
      const fields = createCrewRecordSchema.parse(input);
      const user = await person(userId);
      const { today: day, shop } = await today();
      if (fields.doneOn > day) throw new AppError('validation_failed', 'That date has not come yet', { doneOn: `Today (${day}) at the latest` });
      if (fields.nextDueOn !== null && fields.nextDueOn < fields.doneOn) throw new AppError('validation_failed', 'The next due date is before the date it was done', { nextDueOn: 'On or after the date it was done' });
      const nextDueOn = nextDueDate(fields.doneOn, intervalOf(fields.kind, shop), fields.nextDueOn);
      const row = {
        userId,
        kind: fields.kind,
        doneOn: fields.doneOn,
        nextDueOn,
        respiratorModel: fields.kind === 'fit-test' ? fields.respiratorModel : null,
        result: fields.kind === 'fit-test' ? fields.result : null,
        title: fields.kind === 'training' ? fields.title : null,
        notes: fields.notes,
        recordedById: actor.id,
        recordedByName: actor.name,
        recordedAt: clock.now().toISOString(),
      };
      const saved = await data.transaction(async (tx) => {
        const created = await tx.crewRecords.save(tx.crewRecords.create(row));
        // The trail says a record was made, never what it says: the lead reads the trail.
        await recordAudit(tx, actor, { action: 'create', entity: 'crew-record', entityId: created.id, summary: `Recorded a crew protection record for ${user.name}`, siteId: user.siteId }, clock.now());
        return created;
      });
      return toCrewRecordDto(saved);
    },
  };
}

export type CrewService = ReturnType<typeof createCrewService>;
