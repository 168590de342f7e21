import { createHash, randomBytes } from 'node:crypto';
import { dewPointC } from '../../shared/finishing/conditions';
import type { List } from '../../shared/schemas/common';
import { createReadingSchema, type CreateReadingInput, type Reading } from '../../shared/schemas/reading';
import type { SiteData } from '../data/site-data';
import type { ReadingEntity } from '../db/entities/reading.entity';
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

/** A booth sensor's token, once checked: the booth it speaks for and that booth's site. */
export interface SensorBooth {
  boothId: number;
  siteId: number;
}

/** Conditions in booths and at racks: the site's record, readable and writable by that site only. */
export function createReadingService(data: SiteData, events: EventBus, clock: Clock = systemClock) {
  return {
    /** A sensor may only post for the booth its token belongs to. */
    async record(input: CreateReadingInput, source: { userId: number | null; sensorBoothId?: number }): Promise<Reading> {
      const fields = createReadingSchema.parse(input);
      assertHappenedNearNow(fields.at, 'at', clock.now());
      if (source.sensorBoothId !== undefined && fields.boothId !== source.sensorBoothId) {
        throw new AppError('forbidden', 'This sensor token belongs to another booth');
      }
      const booth = fields.boothId ? await data.booths.findOneBy({ id: fields.boothId }) : null;
      const rack = fields.rackId ? await data.racks.findOneBy({ id: fields.rackId }) : null;
      if (fields.boothId && !booth) throw new AppError('validation_failed', 'No such booth', { boothId: 'Choose a booth' });
      if (fields.rackId && !rack) throw new AppError('validation_failed', 'No such rack', { rackId: 'Choose a rack' });
      const siteId = booth?.siteId ?? rack?.siteId ?? null;
      const reading = await data.transaction((tx) =>
        tx.readings.save(
          tx.readings.create({
            ...fields,
            at: new Date(fields.at ?? clock.now()).toISOString(),
            dewPointC: dewPointC(fields.airTempC, Math.max(fields.relativeHumidityPct, 0.1)),
            source: source.sensorBoothId !== undefined ? 'sensor' : 'typed',
            recordedById: source.userId,
          }),
        ),
      );
      events.publish({ type: 'reading.created', id: reading.id, boothId: reading.boothId, rackId: reading.rackId, siteId });
      return toReadingDto(reading);
    },

    async list(query: { boothId?: number; rackId?: number; page: number; pageSize: number }): Promise<List<Reading>> {
      const where = { ...(query.boothId ? { boothId: query.boothId } : {}), ...(query.rackId ? { rackId: query.rackId } : {}) };
      const [rows, total] = await data.readings.findAndCount({ where, order: { at: 'DESC', id: 'DESC' }, skip: (query.page - 1) * query.pageSize, take: query.pageSize });
      return { items: rows.map(toReadingDto), total, page: query.page, pageSize: query.pageSize };
    },

    /** A new bearer token for the booth's sensor; only its hash is kept, so it is shown once. */
    async issueSensorToken(boothId: number, actor: Actor): Promise<string> {
      const token = `bws_${randomBytes(24).toString('base64url')}`;
      await data.transaction(async (tx) => {
        const booth = await tx.booths.findOneBy({ id: boothId });
        if (!booth) throw notFound('Booth');
        await tx.booths.update({ id: boothId }, { sensorTokenHash: hashToken(token) });
        await recordAudit(tx, actor, { action: 'issue-token', entity: 'booth', entityId: boothId, summary: `Issued a new sensor token for ${booth.name}`, siteId: booth.siteId }, clock.now());
      });
      return token;
    },

    /** Which booth a sensor token speaks for; looked up across every site, as the token itself names the booth. */
    async boothForToken(token: string): Promise<SensorBooth | null> {
      const booth = await data.acrossSites.booths.findOneBy({ sensorTokenHash: hashToken(token) });
      return booth ? { boothId: booth.id, siteId: booth.siteId } : null;
    },
  };
}

export type ReadingService = ReturnType<typeof createReadingService>;
