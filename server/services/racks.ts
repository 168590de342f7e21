import type { DataSource } from 'typeorm';
import { createRackSchema, type Rack } from '../../shared/schemas/rack';
import { RackEntity } from '../db/entities/rack.entity';
import { systemClock, type Clock } from '../lib/clock';
import { createCrudService } from './crud-service';

export function toRackDto(rack: RackEntity): Rack {
  return {
    id: rack.id,
    name: rack.name,
    location: rack.location,
    shelves: rack.shelves,
    shelfAreaM2: rack.shelfAreaM2,
    dryingTempC: rack.dryingTempC,
    totalAreaM2: Math.round(rack.shelves * rack.shelfAreaM2 * 100) / 100,
    siteId: rack.siteId,
    createdAt: rack.createdAt,
    updatedAt: rack.updatedAt,
  };
}

export function createRackService(dataSource: DataSource, clock: Clock = systemClock) {
  return createCrudService(dataSource, clock, {
    entity: RackEntity,
    noun: 'rack',
    createSchema: createRackSchema,
    order: { name: 'ASC', id: 'ASC' },
    toDto: toRackDto,
    siteScoped: true,
  });
}

export type RackService = ReturnType<typeof createRackService>;
