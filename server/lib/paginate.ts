import type { FindManyOptions, ObjectLiteral } from 'typeorm';
import type { List, PageQuery } from '../../shared/schemas/common';
import type { ScopedRepository } from '../data/scoped-repository';

/** One page of a table as the scope sees it, mapped to DTOs, in the §7 list shape. */
export async function paginate<E extends ObjectLiteral, D>(repo: ScopedRepository<E>, query: PageQuery, options: FindManyOptions<E>, toDto: (entity: E) => D): Promise<List<D>> {
  const [rows, total] = await repo.findAndCount({ ...options, skip: (query.page - 1) * query.pageSize, take: query.pageSize });
  return { items: rows.map(toDto), total, page: query.page, pageSize: query.pageSize };
}
