import { inTransaction } from '../db/transaction';
import type { DataSource, EntityTarget, FindOptionsOrder, ObjectLiteral } from 'typeorm';
import type { z } from 'zod';
import type { List, PageQuery } from '../../shared/schemas/common';
import { AppError, notFound } from '../lib/app-error';
import type { Clock } from '../lib/clock';
import { paginate } from '../lib/paginate';
import { everySite, inScope, siteForWrite, type SiteScope } from '../lib/site-scope';
import { SiteEntity } from '../db/entities/site.entity';
import type { EntityManager } from 'typeorm';
import { changedFields, recordAudit, type Actor } from './audit';

interface Timestamped extends ObjectLiteral {
  id: number;
  name: string;
  createdAt: string;
  updatedAt: string;
}

export interface CrudOptions<E extends Timestamped, D, C extends z.ZodType> {
  entity: EntityTarget<E>;
  /** The word people use, for messages and the audit trail: "booth", "rack". */
  noun: string;
  createSchema: C;
  order: FindOptionsOrder<E>;
  toDto: (entity: E) => D;
  /** The entity has a site_id: lists, reads and writes keep to the caller's sites. */
  siteScoped?: boolean;
}

const capitalise = (word: string) => word.charAt(0).toUpperCase() + word.slice(1);

/** List, read, create and patch for simple master data, each change audited in its transaction. */
export function createCrudService<E extends Timestamped, D, C extends z.ZodType>(dataSource: DataSource, clock: Clock, options: CrudOptions<E, D, C>) {
  const { entity, noun, toDto } = options;
  const repo = () => dataSource.getRepository(entity);

  const scoped = options.siteScoped === true;
  const visible = (row: E, scope: SiteScope) => !scoped || inScope(scope, (row as { siteId?: number }).siteId ?? 1);

  async function siteFor(manager: EntityManager, scope: SiteScope, requested: number | undefined): Promise<{ siteId?: number }> {
    if (!scoped) return {};
    const siteId = siteForWrite(scope, requested);
    if (!(await manager.existsBy(SiteEntity, { id: siteId }))) throw new AppError('validation_failed', 'That site does not exist', { siteId: 'Choose a site' });
    return { siteId };
  }

  return {
    list(query: PageQuery, scope: SiteScope = everySite): Promise<List<D>> {
      const where = scoped && scope.siteId !== null ? ({ siteId: scope.siteId } as never) : undefined;
      return paginate(repo(), query, { order: options.order, where }, toDto);
    },

    async get(id: number, scope: SiteScope = everySite): Promise<D> {
      const row = await repo().findOneBy({ id } as never);
      if (!row || !visible(row, scope)) throw notFound(capitalise(noun));
      return toDto(row);
    },

    async create(input: z.input<C>, actor: Actor, scope: SiteScope = everySite): Promise<D> {
      const fields = options.createSchema.parse(input) as Partial<E> & { siteId?: number };
      const now = clock.now().toISOString();
      return inTransaction(dataSource, async (manager) => {
        const row = manager.create(entity, { ...fields, ...(await siteFor(manager, scope, fields.siteId)), createdAt: now, updatedAt: now } as never) as E;
        await manager.save(row);
        await recordAudit(manager, actor, { action: 'create', entity: noun, entityId: row.id, summary: `Added ${noun} ${row.name}` }, clock.now());
        return toDto(row);
      });
    },

    async update(id: number, patch: Partial<E> & { siteId?: number }, actor: Actor, scope: SiteScope = everySite): Promise<D> {
      const now = clock.now();
      return inTransaction(dataSource, async (manager) => {
        const row = await manager.findOneBy(entity, { id } as never);
        if (!row || !visible(row, scope)) throw notFound(capitalise(noun));
        if (patch.siteId !== undefined) await siteFor(manager, scope, patch.siteId);
        const changes = changedFields(row, patch);
        Object.assign(row, patch, { updatedAt: now.toISOString() });
        await manager.save(row);
        await recordAudit(manager, actor, { action: 'update', entity: noun, entityId: id, summary: `Changed ${noun} ${row.name}`, changes }, now);
        return toDto(row);
      });
    },
  };
}
