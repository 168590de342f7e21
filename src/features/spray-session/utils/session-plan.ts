import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { FinishStep, FinishSystem } from '../../../../shared/schemas/finish-system';
import type { Part } from '../../../../shared/schemas/part';
import type { Product } from '../../../../shared/schemas/product';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { formatQuantity } from '../../../../shared/units';
import { coatOfWords, upperFirst } from '../../../../shared/words';

export type CoatStep = Extract<FinishStep, { kind: 'coat' }>;

export const coatStepsOf = (system: FinishSystem | undefined): CoatStep[] =>
  (system?.steps ?? []).filter((step): step is CoatStep => step.kind === 'coat');

/**
 * The ready list gives how many coat steps a part has had, not which; coats go on in order,
 * so the next one is the first coat step past that count.
 */
export function nextCoatPosition(system: FinishSystem | undefined, ready: ReadyPart | undefined): number | null {
  return coatStepsOf(system)[ready?.coatsDone ?? 0]?.position ?? null;
}

/**
 * The step the coat form starts on for a part: the one planned for it here, unless the part has
 * had that coat already (then a second coat in the same session is its next coat), else its next.
 */
export function suggestedStep(planned: number | null | undefined, system: FinishSystem | undefined, ready: ReadyPart | undefined): number | null {
  const next = nextCoatPosition(system, ready);
  if (planned === null || planned === undefined) return next;
  const plannedIndex = coatStepsOf(system).findIndex((step) => step.position === planned);
  const hadIt = plannedIndex >= 0 && plannedIndex < (ready?.coatsDone ?? 0);
  return hadIt && next !== null ? next : planned;
}

/** "Coat 2 of 3: Kestrel Topcoat, 40 µm dry": a coat step counted among the system's coats, as on the booking form. */
export function coatStepWords(step: CoatStep, coatSteps: CoatStep[], units: UnitSystem): string {
  const number = upperFirst(coatOfWords(coatSteps.findIndex((s) => s.position === step.position) + 1, coatSteps.length));
  return `${number}: ${step.productName}, ${formatQuantity(step.dryFilmUm, 'filmThickness', units)} dry`;
}

export interface FinishWork {
  systemByJob: Map<number, FinishSystem>;
  products: Map<number, Product>;
  ready: Map<number, ReadyPart>;
}

/** The step each planned part is to get: the one the lead planned, else its next coat step. */
export function plannedSteps(session: SpraySession, parts: Part[], work: FinishWork): Map<number, number | null> {
  const steps = new Map<number, number | null>();
  for (const item of session.items) {
    const part = parts.find((p) => p.id === item.partId);
    if (!part) continue;
    steps.set(part.id, item.stepPosition ?? nextCoatPosition(work.systemByJob.get(part.jobId), work.ready.get(part.id)));
  }
  return steps;
}

/** The products the session sprays, from the planned steps; what the cautions and checklist are judged on. */
export function plannedProducts(parts: Part[], steps: Map<number, number | null>, work: FinishWork): Product[] {
  const ids = new Set<number>();
  for (const part of parts) {
    const position = steps.get(part.id);
    const step = work.systemByJob.get(part.jobId)?.steps.find((s) => s.position === position);
    if (step?.kind === 'coat') ids.add(step.productId);
  }
  return [...ids].flatMap((id) => work.products.get(id) ?? []);
}

/**
 * The planned parts the coat form starts with: those whose next coat is the step planned for them
 * here. A part that has just had that step in this session, or is further on, is left for the
 * sprayer to add by hand.
 */
export function partsDueNow(session: SpraySession, parts: Part[], work: FinishWork, sessionCoats: Pick<Coat, 'partIds' | 'stepPosition'>[]): number[] {
  const coatedHere = new Map<number, Set<number | null>>();
  for (const coat of sessionCoats) for (const id of coat.partIds) coatedHere.set(id, (coatedHere.get(id) ?? new Set()).add(coat.stepPosition));
  const due = session.items.filter((item) => {
    const part = parts.find((p) => p.id === item.partId);
    const next = part ? nextCoatPosition(work.systemByJob.get(part.jobId), work.ready.get(part.id)) : null;
    if (next === null) return false;
    const here = coatedHere.get(item.partId);
    return item.stepPosition === null ? !here?.size : item.stepPosition === next && !here?.has(next);
  });
  return [...new Set(due.map((item) => item.partId))];
}
