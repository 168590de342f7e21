import { In, type EntityManager } from 'typeorm';
import type { ChecklistProduct } from '../../shared/finishing/checklist';
import { PartEntity } from '../db/entities/part.entity';
import { ProductEntity } from '../db/entities/product.entity';
import { SpraySessionItemEntity } from '../db/entities/spray-session-item.entity';
import { currentCoatsByPart, nextCoatStep, stepsByJob } from './part-coats';

/** The products a session will spray: each planned part's step (or its next coat step). */
export async function sessionProducts(manager: EntityManager, spraySessionId: number): Promise<ChecklistProduct[]> {
  const items = await manager.findBy(SpraySessionItemEntity, { spraySessionId });
  if (items.length === 0) return [];
  const parts = await manager.findBy(PartEntity, { id: In(items.map((i) => i.partId)) });
  const [steps, coats] = await Promise.all([stepsByJob(manager, parts), currentCoatsByPart(manager, parts.map((p) => p.id))]);
  const productIds = new Set<number>();
  for (const item of items) {
    const part = parts.find((p) => p.id === item.partId);
    const system = part ? (steps.get(part.jobId) ?? []) : [];
    const position = item.stepPosition ?? nextCoatStep(system, coats.get(item.partId) ?? []);
    const step = position === null ? undefined : system[position];
    if (step?.kind === 'coat') productIds.add(step.productId);
  }
  if (productIds.size === 0) return [];
  const products = await manager.findBy(ProductEntity, { id: In([...productIds]) });
  return products.map(({ name, chemistry, hazards, minApplicationTempC, maxRelativeHumidityPct }) => ({ name, chemistry, hazards, minApplicationTempC, maxRelativeHumidityPct }));
}
