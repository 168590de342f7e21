import { inTransaction } from '../db/transaction';
import type { DataSource, EntityTarget, FindOptionsOrder, ObjectLiteral } from 'typeorm';
import type { z } from 'zod';
import type { List, PageQuery } from '../../shared/schemas/common';
import { notFound } from '../lib/app-error';
import type { Clock } from '../lib/clock';
import { paginate } from '../lib/paginate';
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
}

const capitalise = (word: string) => word.charAt(0).toUpperCase() + word.slice(1);

/** List, read, create and patch for simple master data, each change audited in its transaction. */
export function createCrudService<E extends Timestamped, D, C extends z.ZodType>(dataSource: DataSource, clock: Clock, options: CrudOptions<E, D, C>) {
  const { entity, noun, toDto } = options;
  const repo = () => dataSource.getRepository(entity);

  return {
    list(query: PageQuery): Promise<List<D>> {
      return paginate(repo(), query, { order: options.order }, toDto);
    },

    async get(id: number): Promise<D> {
      const row = await repo().findOneBy({ id } as never);
      if (!row) throw notFound(capitalise(noun));
      return toDto(row);
    },

    async create(input: z.input<C>, actor: Actor): Promise<D> {
      const fields = options.createSchema.parse(input) as Partial<E>;
      const now = clock.now().toISOString();
      return inTransaction(dataSource, async (manager) => {
        const row = manager.create(entity, { ...fields, createdAt: now, updatedAt: now } as never) as E;
        await manager.save(row);
        await recordAudit(manager, actor, { action: 'create', entity: noun, entityId: row.id, summary: `Added ${noun} ${row.name}` }, clock.now());
        return toDto(row);
      });
    },

    async update(id: number, patch: Partial<E>, actor: Actor): Promise<D> {
      const now = clock.now();
      return inTransaction(dataSource, async (manager) => {
        const row = await manager.findOneBy(entity, { id } as never);
        if (!row) throw notFound(capitalise(noun));
        const changes = changedFields(row, patch);
        Object.assign(row, patch, { updatedAt: now.toISOString() });
        await manager.save(row);
        await recordAudit(manager, actor, { action: 'update', entity: noun, entityId: id, summary: `Changed ${noun} ${row.name}`, changes }, now);
        return toDto(row);
      });
    },
  };
}
