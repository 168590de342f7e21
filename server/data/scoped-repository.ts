import {
  In,
  type DeepPartial,
  type EntityManager,
  type EntityTarget,
  type FindManyOptions,
  type FindOneOptions,
  type FindOptionsWhere,
  type ObjectLiteral,
  type QueryDeepPartialEntity,
  type SelectQueryBuilder,
} from 'typeorm';
import { AppError } from '../lib/app-error';
import { inScope, type SiteScope } from '../lib/site-scope';
import type { SiteRule } from './site-rules';

const outsideScope = () => new AppError('forbidden', 'That belongs to another site; you can change your own site’s records only');

/**
 * One table seen through a site scope: every read is limited to the scope's sites and every
 * write is refused when the row (as stored, or as it will be) lies on another site. Services
 * reach the database only through these, so a forgotten site filter cannot happen.
 */
export class ScopedRepository<E extends ObjectLiteral> {
  constructor(
    private readonly manager: EntityManager,
    private readonly target: EntityTarget<E>,
    private readonly rule: SiteRule<E>,
    private readonly scope: SiteScope,
  ) {}

  private get limited(): boolean {
    return this.scope.siteId !== null;
  }

  /**
   * A query builder on `alias`, already limited to the scope. Its `where()` and `andWhere()` add a
   * bracketed condition to that limit (so an `a OR b` can never escape it); `orWhere()` is refused.
   */
  select(alias: string): SelectQueryBuilder<E> {
    const qb = this.manager.createQueryBuilder(this.target, alias);
    if (!this.rule.where || !this.limited) return qb;
    const and = qb.andWhere.bind(qb) as (condition: unknown, params?: ObjectLiteral) => SelectQueryBuilder<E>;
    const bracketed = (condition: unknown, params?: ObjectLiteral) => and(typeof condition === 'string' ? `(${condition})` : condition, params);
    bracketed(this.rule.where(alias), { scopeSiteId: this.scope.siteId });
    Object.assign(qb, {
      where: bracketed,
      andWhere: bracketed,
      orWhere: () => {
        throw new Error('A site-scoped query takes no orWhere(); put the alternatives in one bracketed andWhere()');
      },
    });
    return qb;
  }

  find(options: FindManyOptions<E> = {}): Promise<E[]> {
    return this.select('scoped').setFindOptions(options).getMany();
  }

  findBy(where: FindOptionsWhere<E> | FindOptionsWhere<E>[]): Promise<E[]> {
    return this.find({ where });
  }

  findOne(options: FindOneOptions<E>): Promise<E | null> {
    return this.select('scoped').setFindOptions(options).getOne();
  }

  findOneBy(where: FindOptionsWhere<E> | FindOptionsWhere<E>[]): Promise<E | null> {
    return this.findOne({ where });
  }

  findAndCount(options: FindManyOptions<E> = {}): Promise<[E[], number]> {
    return this.select('scoped').setFindOptions(options).getManyAndCount();
  }

  count(options: FindManyOptions<E> = {}): Promise<number> {
    return this.select('scoped').setFindOptions(options).getCount();
  }

  countBy(where: FindOptionsWhere<E> | FindOptionsWhere<E>[]): Promise<number> {
    return this.count({ where });
  }

  async existsBy(where: FindOptionsWhere<E> | FindOptionsWhere<E>[]): Promise<boolean> {
    return (await this.select('scoped').setFindOptions({ where }).getExists()) === true;
  }

  create(fields: DeepPartial<E>): E {
    return this.manager.create(this.target, fields);
  }

  async save<T extends DeepPartial<E>>(row: T): Promise<T & E> {
    await this.assertWritable([row as Partial<E>]);
    return this.manager.save(this.target, row) as Promise<T & E>;
  }

  async saveMany<T extends DeepPartial<E>>(rows: T[], options?: { chunk?: number }): Promise<(T & E)[]> {
    await this.assertWritable(rows as Partial<E>[]);
    return this.manager.save(this.target, rows, options) as Promise<(T & E)[]>;
  }

  async insert(rows: QueryDeepPartialEntity<E>[]): Promise<void> {
    await this.assertWritable(rows as Partial<E>[]);
    if (rows.length) await this.manager.insert(this.target, rows);
  }

  /** Inserts the rows; one whose unique key is already taken is left as it is. */
  async insertNew(rows: QueryDeepPartialEntity<E>[]): Promise<void> {
    await this.assertWritable(rows as Partial<E>[]);
    if (rows.length) await this.manager.createQueryBuilder().insert().into(this.target).values(rows).orIgnore().execute();
  }

  /** Changes the matching rows of the scope; answers how many changed, when the driver says. */
  async update(where: FindOptionsWhere<E>, patch: QueryDeepPartialEntity<E>): Promise<number | undefined> {
    await this.assertWritable([patch as Partial<E>]);
    const result = await this.manager.update(this.target, await this.withinScope(where), patch);
    return result.affected;
  }

  async delete(where: FindOptionsWhere<E>): Promise<void> {
    await this.manager.delete(this.target, await this.withinScope(where));
  }

  /** The criteria narrowed to the scope's rows, so an update or delete never reaches another site. */
  private async withinScope(where: FindOptionsWhere<E>): Promise<FindOptionsWhere<E>> {
    if (this.rule.shared || !this.limited) return where;
    if (!this.rule.where) {
      // Rows every site reads (a part) but whose placement is a site's: each must be on the scope's sites.
      for (const row of await this.manager.findBy(this.target, where)) await this.assertWritable([row]);
      return where;
    }
    const ids = (await this.find({ where, select: { id: true } as never })).map((row) => row.id as number);
    return { ...where, id: In(ids) } as FindOptionsWhere<E>;
  }

  /** What is stored and what will be stored must both lie on the scope's sites. */
  private async assertWritable(rows: Partial<E>[]): Promise<void> {
    if (this.rule.shared || (this.scope.allSites && this.scope.siteId === null)) return;
    for (const row of rows) {
      const stored = row.id === undefined ? null : await this.manager.findOneBy(this.target, { id: row.id } as FindOptionsWhere<E>);
      const sites = [...(await this.rule.sitesOf(row, this.manager)), ...(stored ? await this.rule.sitesOf(stored, this.manager) : [])];
      if (sites.some((site) => !inScope(this.scope, site))) throw outsideScope();
    }
  }
}
