import { In } from 'typeorm';
import type { ChecklistProduct } from '../../shared/finishing/checklist';
import type { SiteData } from '../data/site-data';
import { currentCoatsByPart, nextCoatStep, stepsByJob } from './part-coats';

/** The products a spray session will spray: each planned part's step (or its next coat step, from the part's whole history). */
export async function spraySessionProducts(data: SiteData, spraySessionId: number): Promise<ChecklistProduct[]> {
  const items = await data.spraySessionItems.findBy({ spraySessionId });
  if (items.length === 0) return [];
  const whole = data.acrossSites;
  const parts = await data.parts.findBy({ id: In(items.map((i) => i.partId)) });
  const [steps, coats] = await Promise.all([stepsByJob(whole, parts), currentCoatsByPart(whole, parts.map((p) => p.id))]);
  const productIds = new Set<number>();
  for (const item of items) {
    const part = parts.find((p) => p.id === item.partId);
    const system = part ? (steps.get(part.jobId) ?? []) : [];
    const position = item.stepPosition ?? nextCoatStep(system, coats.get(item.partId) ?? []);
    const step = position === null ? undefined : system[position];
    if (step?.kind === 'coat') productIds.add(step.productId);
  }
  if (productIds.size === 0) return [];
  const products = await data.products.findBy({ id: In([...productIds]) });
  return products.map(({ name, chemistry, hazards, minApplicationTempC, maxRelativeHumidityPct }) => ({ name, chemistry, hazards, minApplicationTempC, maxRelativeHumidityPct }));
}
