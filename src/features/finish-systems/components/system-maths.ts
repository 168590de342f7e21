import { theoreticalSpreadingRateM2PerL } from '../../../../shared/finishing/film';
import { shortestTimeThroughSystem, type SystemTime, type SystemTimeStep } from '../../../../shared/finishing/system-time';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';

/** A step as saved or as being edited; while editing, a coat may not have its product or film yet. */
export type StepDraft = { kind: 'coat'; productId?: number; dryFilmUm?: number } | { kind: 'abrade'; grit?: string };

export type ProductsById = ReadonlyMap<number, Product>;

type CompleteCoat = { kind: 'coat'; product: Product; dryFilmUm: number };

function completeCoat(step: StepDraft, products: ProductsById): CompleteCoat | null {
  if (step.kind !== 'coat' || !step.productId) return null;
  const product = products.get(step.productId);
  const film = step.dryFilmUm;
  if (!product || typeof film !== 'number' || !Number.isFinite(film) || film <= 0) return null;
  return { kind: 'coat', product, dryFilmUm: film };
}

/** True when every coat names a known product and a dry film, so the totals mean something. */
export function stepsComplete(steps: StepDraft[], products: ProductsById): boolean {
  return steps.some((s) => s.kind === 'coat') && steps.every((s) => s.kind === 'abrade' || completeCoat(s, products) !== null);
}

/**
 * Litres of paint as supplied per m² of coated face for the whole system: the sum over coats
 * of 1 / (theoretical spreading rate). Theoretical: nothing lost to overspray or soaked into bare wood.
 */
export function litresPerSquareMetre(steps: StepDraft[], products: ProductsById): number {
  return steps.reduce((sum, step) => {
    const coat = completeCoat(step, products);
    if (!coat) return sum;
    return sum + 1 / theoreticalSpreadingRateM2PerL({ volumeSolidsPct: coat.product.volumeSolidsPct, dryFilmUm: coat.dryFilmUm });
  }, 0);
}

export function timeThroughSystem(steps: StepDraft[], products: ProductsById, tempC: number, units: UnitSystem): SystemTime | { error: string } {
  const tables = new Map([...products].map(([id, p]) => [id, { dryingTimes: p.dryingTimes, minApplicationTempC: p.minApplicationTempC }]));
  const timeSteps: SystemTimeStep[] = steps.map((s) => (s.kind === 'coat' ? { kind: 'coat', productId: s.productId ?? 0 } : { kind: 'abrade', grit: s.grit }));
  try {
    return shortestTimeThroughSystem(timeSteps, tables, tempC, { units });
  } catch (error) {
    return { error: error instanceof Error ? error.message : 'The time through this system could not be worked out.' };
  }
}
