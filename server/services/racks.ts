import { createRackSchema, type Rack } from '../../shared/schemas/rack';
import type { RackEntity } from '../db/entities/rack.entity';
import type { SiteData } from '../data/site-data';
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

export function createRackService(data: SiteData, clock: Clock = systemClock) {
  return createCrudService(data, clock, {
    table: (d) => d.racks,
    noun: 'rack',
    createSchema: createRackSchema,
    order: { name: 'ASC', id: 'ASC' },
    toDto: toRackDto,
    siteOwned: true,
  });
}

export type RackService = ReturnType<typeof createRackService>;
