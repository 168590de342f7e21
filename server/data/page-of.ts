import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';

/**
 * One page of a query's rows and how many rows there are in all. A first page shorter than the
 * page size is the whole list, so it needs no count. The query must join no entities: with a
 * plain LIMIT and OFFSET, TypeORM then sends one query for the page instead of two.
 */
export async function pageOf<E extends ObjectLiteral>(qb: SelectQueryBuilder<E>, page: number, pageSize: number): Promise<[E[], number]> {
  const rows = await qb
    .clone()
    .offset((page - 1) * pageSize)
    .limit(pageSize)
    .getMany();
  if (page === 1 && rows.length < pageSize) return [rows, rows.length];
  return [rows, await qb.getCount()];
}
