import { In } from 'typeorm';
import type { List } from '../../shared/schemas/common';
import {
  createProductSchema,
  storedThinning,
  type CreateLotInput,
  type CreateProductInput,
  type Lot,
  type Product,
  type ProductListQuery,
  type UpdateProductInput,
} from '../../shared/schemas/product';
import { calendarDateIn } from '../../shared/time';
import type { SiteData } from '../data/site-data';
import type { ProductEntity } from '../db/entities/product.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import type { EventBus } from './events';
import { changedFields, recordAudit, type Actor } from './audit';
import { toFileRef, type FileService, type Upload } from './files';
import { toLotDto, toProductDto } from './product-dto';
import type { SettingsService } from './settings';

/** The stored range as a client sends it: null for a range the data sheet does not give. */
function thinningAsSent(product: ProductEntity): { thinnerMinPct: number | null; thinnerMaxPct: number | null } {
  return product.thinningRangeGiven ? { thinnerMinPct: product.thinnerMinPct, thinnerMaxPct: product.thinnerMaxPct } : { thinnerMinPct: null, thinnerMaxPct: null };
}

/** Deletes a file's record when no product points at it any more; returns the stored name whose bytes can go. */
async function forgetUnusedFile(tx: SiteData, fileId: number): Promise<string | null> {
  const stillUsed = await tx.products.existsBy([{ tdsFileId: fileId }, { sdsFileId: fileId }]);
  const file = stillUsed ? null : await tx.files.findOneBy({ id: fileId });
  if (!file) return null;
  await tx.files.delete({ id: fileId });
  return file.storedName;
}

/** Data sheets, their lots and documents are the group's: every site sprays from the same sheets. */
export function createProductService(data: SiteData, files: FileService, settings: SettingsService, clock: Clock = systemClock, events?: EventBus) {
  // After the transaction commits, so a screen that refetches sees the change. Data sheets are the group's.
  const published = <T>(id: number, result: T): T => {
    events?.publish({ type: 'product.changed', id, siteId: null });
    return result;
  };

  async function today(): Promise<string> {
    return calendarDateIn(clock.now(), (await settings.get()).timezone);
  }

  /** Lots and files for many products in two queries, not one per product. */
  async function hydrate(products: ProductEntity[]): Promise<Product[]> {
    const ids = products.map((p) => p.id);
    const fileIds = products.flatMap((p) => [p.tdsFileId, p.sdsFileId]).filter((id): id is number => id !== null);
    const [lots, storedFiles, date] = await Promise.all([
      ids.length ? data.lots.find({ where: { productId: In(ids) }, order: { createdAt: 'DESC' } }) : [],
      fileIds.length ? data.files.findBy({ id: In(fileIds) }) : [],
      today(),
    ]);
    const fileById = new Map(storedFiles.map((f) => [f.id, toFileRef(f)]));
    return products.map((p) => toProductDto(p, lots.filter((l) => l.productId === p.id), fileById, date));
  }

  async function findOrFail(tx: SiteData, id: number): Promise<ProductEntity> {
    const product = await tx.products.findOneBy({ id });
    if (!product) throw notFound('Product');
    return product;
  }

  return {
    async list(query: ProductListQuery): Promise<List<Product>> {
      const qb = data.products.select('p');
      if (query.q) qb.where('(LOWER(p.name) LIKE :q OR LOWER(p.maker_ref) LIKE :q)', { q: `%${query.q.toLowerCase()}%` });
      const sortColumn = { name: 'p.name', kind: 'p.kind', chemistry: 'p.chemistry', updatedAt: 'p.updated_at' }[query.sort];
      qb.orderBy(sortColumn, query.dir === 'asc' ? 'ASC' : 'DESC').addOrderBy('p.id', 'ASC');
      const [rows, total] = await qb.skip((query.page - 1) * query.pageSize).take(query.pageSize).getManyAndCount();
      return { items: await hydrate(rows), total, page: query.page, pageSize: query.pageSize };
    },

    async get(id: number): Promise<Product> {
      const [product] = await hydrate([await findOrFail(data, id)]);
      return product;
    },

    async create(input: CreateProductInput, actor: Actor): Promise<Product> {
      const fields = createProductSchema.parse(input);
      const now = clock.now();
      const id = await data.transaction(async (tx) => {
        const product = await tx.products.save(tx.products.create({ ...fields, ...storedThinning(fields), tdsFileId: null, sdsFileId: null, createdAt: now.toISOString(), updatedAt: now.toISOString() }));
        await recordAudit(tx, actor, { action: 'create', entity: 'product', entityId: product.id, summary: `Added data sheet ${product.name}` }, now);
        return product.id;
      });
      return published(id, await this.get(id));
    },

    async update(id: number, patch: UpdateProductInput, actor: Actor): Promise<Product> {
      const now = clock.now();
      await data.transaction(async (tx) => {
        const product = await findOrFail(tx, id);
        // Checks that span fields (thinner range, colder-is-slower) must hold for the product as it will be.
        const asWillBe = createProductSchema.parse({ ...product, ...thinningAsSent(product), ...patch });
        const touchesThinning = patch.thinnerMinPct !== undefined || patch.thinnerMaxPct !== undefined;
        const next = { ...patch, ...(touchesThinning ? storedThinning(asWillBe) : {}) } as Partial<ProductEntity>;
        const changes = changedFields(product, next);
        Object.assign(product, next, { updatedAt: now.toISOString() });
        await tx.products.save(product);
        await recordAudit(tx, actor, { action: 'update', entity: 'product', entityId: id, summary: `Changed data sheet ${product.name}`, changes }, now);
      });
      return published(id, await this.get(id));
    },

    async addLot(productId: number, input: CreateLotInput & { expiresOn: string | null }, actor: Actor): Promise<Lot> {
      const now = clock.now();
      const lot = await data.transaction(async (tx) => {
        const product = await findOrFail(tx, productId);
        if (await tx.lots.existsBy({ productId, lotNumber: input.lotNumber })) {
          throw new AppError('conflict', `Lot ${input.lotNumber} is already recorded for ${product.name}`, { lotNumber: 'Already recorded' });
        }
        const saved = await tx.lots.save(tx.lots.create({ productId, lotNumber: input.lotNumber, expiresOn: input.expiresOn, createdAt: now.toISOString() }));
        await recordAudit(tx, actor, { action: 'create', entity: 'lot', entityId: saved.id, summary: `Added lot ${saved.lotNumber} of ${product.name}` }, now);
        return saved;
      });
      return published(productId, toLotDto(lot, await today()));
    },

    /**
     * Stores the PDF and points the product at it. The bytes it replaces are deleted once the
     * change has committed (and their record with it); if the change fails, the new bytes go.
     */
    async attachDocument(productId: number, kind: 'tds' | 'sds', upload: Upload | undefined, actor: Actor): Promise<Product> {
      const now = clock.now();
      let stored: string | null = null;
      let replaced: string | null = null;
      try {
        await data.transaction(async (tx) => {
          const product = await findOrFail(tx, productId);
          const file = await files.storePdf(tx, upload, actor.id);
          stored = file.storedName;
          const previousId = kind === 'tds' ? product.tdsFileId : product.sdsFileId;
          if (kind === 'tds') product.tdsFileId = file.id;
          else product.sdsFileId = file.id;
          product.updatedAt = now.toISOString();
          await tx.products.save(product);
          replaced = previousId === null ? null : await forgetUnusedFile(tx, previousId);
          const what = kind === 'tds' ? 'technical data sheet' : 'safety data sheet';
          await recordAudit(tx, actor, { action: 'attach', entity: 'product', entityId: productId, summary: `Attached ${what} ${file.originalName} to ${product.name}` }, now);
        });
      } catch (error) {
        if (stored) await files.discard(stored);
        throw error;
      }
      if (replaced) await files.discard(replaced);
      return published(productId, await this.get(productId));
    },
  };
}

export type ProductService = ReturnType<typeof createProductService>;
