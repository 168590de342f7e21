import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { dewPointC } from '../../shared/finishing/conditions';
import type { List } from '../../shared/schemas/common';
import { createReadingSchema, type CreateReadingInput, type Reading } from '../../shared/schemas/reading';
import { BoothEntity } from '../db/entities/booth.entity';
import { RackEntity } from '../db/entities/rack.entity';
import { ReadingEntity } from '../db/entities/reading.entity';
import { inTransaction } from '../db/transaction';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { assertHappenedNearNow } from '../lib/instant-window';
import { recordAudit, type Actor } from './audit';
import type { EventBus } from './events';

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

function toReadingDto(r: ReadingEntity): Reading {
  const { id, boothId, rackId, at, airTempC, relativeHumidityPct, surfaceTempC, source } = r;
  return { id, boothId, rackId, at, airTempC, relativeHumidityPct, surfaceTempC, dewPointC: Math.round(r.dewPointC * 100) / 100, source };
}

export function createReadingService(dataSource: DataSource, events: EventBus, clock: Clock = systemClock) {
  return {
    /** A sensor may only post for the booth its token belongs to. */
    async record(input: CreateReadingInput, source: { userId: number | null; sensorBoothId?: number }): Promise<Reading> {
      const fields = createReadingSchema.parse(input);
      assertHappenedNearNow(fields.at, 'at', clock.now());
      if (source.sensorBoothId !== undefined && fields.boothId !== source.sensorBoothId) {
        throw new AppError('forbidden', 'This sensor token belongs to another booth');
      }
      if (fields.boothId && !(await dataSource.getRepository(BoothEntity).existsBy({ id: fields.boothId }))) throw new AppError('validation_failed', 'No such booth', { boothId: 'Choose a booth' });
      if (fields.rackId && !(await dataSource.getRepository(RackEntity).existsBy({ id: fields.rackId }))) throw new AppError('validation_failed', 'No such rack', { rackId: 'Choose a rack' });
      const reading = await inTransaction(dataSource, (manager) =>
        manager.save(
          manager.create(ReadingEntity, {
            ...fields,
            at: new Date(fields.at ?? clock.now()).toISOString(),
            dewPointC: dewPointC(fields.airTempC, Math.max(fields.relativeHumidityPct, 0.1)),
            source: source.sensorBoothId !== undefined ? 'sensor' : 'typed',
            recordedById: source.userId,
          }),
        ),
      );
      events.publish({ type: 'reading.created', id: reading.id, boothId: reading.boothId, rackId: reading.rackId });
      return toReadingDto(reading);
    },

    async list(query: { boothId?: number; rackId?: number; page: number; pageSize: number }): Promise<List<Reading>> {
      const where = { ...(query.boothId ? { boothId: query.boothId } : {}), ...(query.rackId ? { rackId: query.rackId } : {}) };
      const [rows, total] = await dataSource.getRepository(ReadingEntity).findAndCount({ where, order: { at: 'DESC', id: 'DESC' }, skip: (query.page - 1) * query.pageSize, take: query.pageSize });
      return { items: rows.map(toReadingDto), total, page: query.page, pageSize: query.pageSize };
    },

    /** A new bearer token for the booth's sensor; only its hash is kept, so it is shown once. */
    async issueSensorToken(boothId: number, actor: Actor): Promise<string> {
      const token = `bws_${randomBytes(24).toString('base64url')}`;
      await inTransaction(dataSource, async (manager) => {
        const booth = await manager.findOneBy(BoothEntity, { id: boothId });
        if (!booth) throw notFound('Booth');
        await manager.update(BoothEntity, { id: boothId }, { sensorTokenHash: hashToken(token) });
        await recordAudit(manager, actor, { action: 'issue-token', entity: 'booth', entityId: boothId, summary: `Issued a new sensor token for ${booth.name}` }, clock.now());
      });
      return token;
    },

    async boothForToken(token: string): Promise<number | null> {
      const booth = await dataSource.getRepository(BoothEntity).findOneBy({ sensorTokenHash: hashToken(token) });
      return booth?.id ?? null;
    },
  };
}

export type ReadingService = ReturnType<typeof createReadingService>;
