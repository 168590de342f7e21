import { Not } from 'typeorm';
import type { PageQuery } from '../../shared/schemas/common';
import { createSiteSchema, type CreateSiteInput, type Site, type UpdateSiteInput } from '../../shared/schemas/site';
import type { SiteData } from '../data/site-data';
import type { SiteEntity } from '../db/entities/site.entity';
import { AppError } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import type { Actor } from './audit';
import { createCrudService } from './crud-service';

export function toSiteDto(site: SiteEntity): Site {
  return { id: site.id, name: site.name, createdAt: site.createdAt, updatedAt: site.updatedAt };
}

/** Sites are listed to everyone (names for the booth and user forms); only an admin adds or renames one. */
export function createSiteService(data: SiteData, clock: Clock = systemClock) {
  const crud = createCrudService(data, clock, { table: (d) => d.sites, noun: 'site', createSchema: createSiteSchema, order: { name: 'ASC', id: 'ASC' }, toDto: toSiteDto });
  async function nameFree(name: string | undefined, exceptId = 0): Promise<void> {
    if (name && (await data.sites.existsBy({ name, id: Not(exceptId) }))) {
      throw new AppError('conflict', `There is already a site called ${name}`, { name: 'Already in use' });
    }
  }
  return {
    list: (query: PageQuery) => crud.list(query),
    get: (id: number) => crud.get(id),
    async create(input: CreateSiteInput, actor: Actor): Promise<Site> {
      await nameFree(createSiteSchema.parse(input).name);
      return crud.create(input, actor);
    },
    async update(id: number, patch: UpdateSiteInput, actor: Actor): Promise<Site> {
      await nameFree(patch.name, id);
      return crud.update(id, patch, actor);
    },
  };
}

export type SiteService = ReturnType<typeof createSiteService>;
