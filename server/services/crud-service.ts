import type { FindOptionsOrder, ObjectLiteral } from 'typeorm';
import type { z } from 'zod';
import type { List, PageQuery } from '../../shared/schemas/common';
import type { ScopedRepository } from '../data/scoped-repository';
import type { SiteData } from '../data/site-data';
import { AppError, notFound } from '../lib/app-error';
import type { Clock } from '../lib/clock';
import { paginate } from '../lib/paginate';
import { siteForWrite } from '../lib/site-scope';
import { changedFields, recordAudit, type Actor } from './audit';

interface Timestamped extends ObjectLiteral {
  id: number;
  name: string;
  createdAt: string;
  updatedAt: string;
}

export interface CrudOptions<E extends Timestamped, D, C extends z.ZodType> {
  /** The table, as the scope sees it. */
  table: (data: SiteData) => ScopedRepository<E>;
  /** The word people use, for messages and the audit trail: "booth", "rack". */
  noun: string;
  createSchema: C;
  order: FindOptionsOrder<E>;
  toDto: (entity: E) => D;
  /** Rows carry a site_id: a new row goes to the caller's site unless an admin names another. */
  siteOwned?: boolean;
}

const capitalise = (word: string) => word.charAt(0).toUpperCase() + word.slice(1);

/** The site a new or moved row goes to, which must exist. */
async function siteFor(tx: SiteData, requested: number | undefined): Promise<number> {
  const siteId = siteForWrite(tx.scope, requested);
  if (!(await tx.sites.existsBy({ id: siteId }))) throw new AppError('validation_failed', 'That site does not exist', { siteId: 'Choose a site' });
  return siteId;
}

/** List, read, create and patch for simple master data, each change audited in its transaction. */
export function createCrudService<E extends Timestamped, D, C extends z.ZodType>(data: SiteData, clock: Clock, options: CrudOptions<E, D, C>) {
  const { table, noun, toDto } = options;
  const owned = options.siteOwned === true;
  const siteOfRow = (row: E): number | null => (owned ? (row as unknown as { siteId: number }).siteId : null);

  return {
    list(query: PageQuery): Promise<List<D>> {
      return paginate(table(data), query, { order: options.order }, toDto);
    },

    async get(id: number): Promise<D> {
      const row = await table(data).findOneBy({ id } as never);
      if (!row) throw notFound(capitalise(noun));
      return toDto(row);
    },

    async create(input: z.input<C>, actor: Actor): Promise<D> {
      const fields = options.createSchema.parse(input) as Partial<E> & { siteId?: number };
      const now = clock.now().toISOString();
      return data.transaction(async (tx) => {
        const site = owned ? { siteId: await siteFor(tx, fields.siteId) } : {};
        const row = await table(tx).save(table(tx).create({ ...fields, ...site, createdAt: now, updatedAt: now } as never));
        await recordAudit(tx, actor, { action: 'create', entity: noun, entityId: row.id, summary: `Added ${noun} ${row.name}`, siteId: siteOfRow(row) }, clock.now());
        return toDto(row);
      });
    },

    async update(id: number, patch: Partial<E> & { siteId?: number }, actor: Actor): Promise<D> {
      const now = clock.now();
      return data.transaction(async (tx) => {
        const row = await table(tx).findOneBy({ id } as never);
        if (!row) throw notFound(capitalise(noun));
        if (owned && patch.siteId !== undefined) await siteFor(tx, patch.siteId);
        const changes = changedFields(row, patch);
        Object.assign(row, patch, { updatedAt: now.toISOString() });
        await table(tx).save(row);
        await recordAudit(tx, actor, { action: 'update', entity: noun, entityId: id, summary: `Changed ${noun} ${row.name}`, changes, siteId: siteOfRow(row) }, now);
        return toDto(row);
      });
    },
  };
}
