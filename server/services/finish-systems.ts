import { In } from 'typeorm';
import type { List, PageQuery } from '../../shared/schemas/common';
import {
  createFinishSystemSchema,
  type CreateFinishSystemInput,
  type FinishStepInput,
  type FinishSystem,
  type UpdateFinishSystemInput,
} from '../../shared/schemas/finish-system';
import type { SiteData } from '../data/site-data';
import type { FinishStepEntity } from '../db/entities/finish-step.entity';
import type { FinishSystemEntity } from '../db/entities/finish-system.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import type { EventBus } from './events';
import { recordAudit, type Actor } from './audit';

function toStepDto(step: FinishStepEntity, productNames: Map<number, string>) {
  if (step.kind === 'abrade') return { kind: 'abrade' as const, position: step.position, grit: step.grit ?? '' };
  return { kind: 'coat' as const, position: step.position, productId: step.productId!, productName: productNames.get(step.productId!) ?? '', dryFilmUm: step.dryFilmUm! };
}

/** Systems with their ordered steps and product names, in three queries whatever the count. */
export async function loadFinishSystems(data: SiteData, systems: FinishSystemEntity[]): Promise<FinishSystem[]> {
  const ids = systems.map((s) => s.id);
  const steps = ids.length ? await data.finishSteps.find({ where: { finishSystemId: In(ids) }, order: { position: 'ASC' } }) : [];
  const productIds = [...new Set(steps.map((s) => s.productId).filter((id): id is number => id !== null))];
  const products = productIds.length ? await data.products.find({ where: { id: In(productIds) }, select: { id: true, name: true } }) : [];
  const names = new Map(products.map((p) => [p.id, p.name]));
  return systems.map((system) => {
    const own = steps.filter((s) => s.finishSystemId === system.id).map((s) => toStepDto(s, names));
    return { id: system.id, name: system.name, description: system.description, steps: own, coatCount: own.filter((s) => s.kind === 'coat').length, createdAt: system.createdAt, updatedAt: system.updatedAt };
  });
}

async function writeSteps(tx: SiteData, finishSystemId: number, steps: FinishStepInput[]): Promise<void> {
  const productIds = [...new Set(steps.flatMap((s) => (s.kind === 'coat' ? [s.productId] : [])))];
  const found = await tx.products.countBy({ id: In(productIds) });
  if (found !== productIds.length) {
    const index = steps.findIndex((s) => s.kind === 'coat');
    throw new AppError('validation_failed', 'A step names a product that does not exist', { [`steps.${index}.productId`]: 'Choose a product from the data sheets' });
  }
  await tx.finishSteps.delete({ finishSystemId });
  await tx.finishSteps.insert(
    steps.map((step, position) => ({
      finishSystemId,
      position,
      kind: step.kind,
      productId: step.kind === 'coat' ? step.productId : null,
      dryFilmUm: step.kind === 'coat' ? step.dryFilmUm : null,
      grit: step.kind === 'abrade' ? step.grit : null,
    })),
  );
}

/** Finish systems are the group's, like the data sheets they name. */
export function createFinishSystemService(data: SiteData, clock: Clock = systemClock, events?: EventBus) {
  // After the transaction commits; finish systems are the group's.
  const published = (system: FinishSystem): FinishSystem => {
    events?.publish({ type: 'finish-system.changed', id: system.id, siteId: null });
    return system;
  };

  async function getWith(tx: SiteData, id: number): Promise<FinishSystem> {
    const system = await tx.finishSystems.findOneBy({ id });
    if (!system) throw notFound('Finish system');
    return (await loadFinishSystems(tx, [system]))[0];
  }

  return {
    async list(query: PageQuery): Promise<List<FinishSystem>> {
      const [rows, total] = await data.finishSystems.findAndCount({ order: { name: 'ASC', id: 'ASC' }, skip: (query.page - 1) * query.pageSize, take: query.pageSize });
      return { items: await loadFinishSystems(data, rows), total, page: query.page, pageSize: query.pageSize };
    },

    get: (id: number) => getWith(data, id),

    async create(input: CreateFinishSystemInput, actor: Actor): Promise<FinishSystem> {
      const { steps, ...fields } = createFinishSystemSchema.parse(input);
      const now = clock.now();
      return data
        .transaction(async (tx) => {
          const system = await tx.finishSystems.save(tx.finishSystems.create({ ...fields, createdAt: now.toISOString(), updatedAt: now.toISOString() }));
          await writeSteps(tx, system.id, steps);
          await recordAudit(tx, actor, { action: 'create', entity: 'finish-system', entityId: system.id, summary: `Added finish system ${system.name}` }, now);
          return getWith(tx, system.id);
        })
        .then(published);
    },

    async update(id: number, patch: UpdateFinishSystemInput, actor: Actor): Promise<FinishSystem> {
      const now = clock.now();
      return data
        .transaction(async (tx) => {
          const system = await tx.finishSystems.findOneBy({ id });
          if (!system) throw notFound('Finish system');
          const { steps, ...fields } = patch;
          Object.assign(system, fields, { updatedAt: now.toISOString() });
          await tx.finishSystems.save(system);
          if (steps) await writeSteps(tx, id, steps);
          const summary = `Changed finish system ${system.name}${steps ? ` (now ${steps.length} steps)` : ''}`;
          await recordAudit(tx, actor, { action: 'update', entity: 'finish-system', entityId: id, summary, changes: { ...fields, ...(steps ? { steps } : {}) } }, now);
          return getWith(tx, id);
        })
        .then(published);
    },
  };
}

export type FinishSystemService = ReturnType<typeof createFinishSystemService>;
