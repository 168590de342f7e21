import { FinishingInputError } from '../errors';
import type { UnitSystem } from '../schemas/common';
import { adjustDryingTimes, type DryingMethod, type DryingRow } from './drying-times';
import { requireNonNegative } from './validate';
import type { FinishingWarning } from './warnings';

/**
 * Minutes a denib between coats takes a sprayer: sanding, dusting off and tacking a batch.
 * Common practice in the trade, no published source; the caller can pass its own figure.
 */
export const defaultAbradeMin = 15;

export type SystemTimeStep = { kind: 'coat'; productId: number } | { kind: 'abrade'; grit?: string };
export type ProductDryingTable = { dryingTimes: DryingRow[]; minApplicationTempC?: number | null };

/**
 * What one step adds to the clock. `waits-for`:
 * - `recoat-opens`: a coat with a later coat after it, waited on until the next coat may go on;
 * - `pack`: the last coat, waited on until the parts may be packed;
 * - `abrade`: a denib between coats, the fixed abrade minutes;
 * - `not-counted`: a step before the first coat or after the last, outside "first coat to packed".
 */
export type SystemStepTime = {
  index: number;
  kind: 'coat' | 'abrade';
  waitsFor: 'recoat-opens' | 'pack' | 'abrade' | 'not-counted';
  minutes: number;
  method: DryingMethod | null;
};

export type SystemTime = { totalMin: number; perStep: SystemStepTime[]; warnings: FinishingWarning[] };

export type SystemTimeOptions = { abradeMin?: number; units?: UnitSystem };

/**
 * The shortest time through a finish system at one drying temperature: from the first coat
 * going on until the last coat can be packed. Each coat but the last waits until its recoat
 * window opens; each abrade step between coats adds `abradeMin`; the last coat adds its pack time.
 */
export function shortestTimeThroughSystem(
  steps: SystemTimeStep[],
  tables: ReadonlyMap<number, ProductDryingTable>,
  tempC: number,
  { abradeMin = defaultAbradeMin, units = 'metric' }: SystemTimeOptions = {},
): SystemTime {
  requireNonNegative('abradeMin', abradeMin, 'the abrade time');
  const coatIndexes = steps.flatMap((step, index) => (step.kind === 'coat' ? [index] : []));
  if (coatIndexes.length === 0) throw new FinishingInputError('steps', 'A finish system needs at least one coat');
  const [first, last] = [coatIndexes[0], coatIndexes[coatIndexes.length - 1]];
  const warnings: FinishingWarning[] = [];
  const perStep = steps.map((step, index): SystemStepTime => {
    if (index < first || index > last) return { index, kind: step.kind, waitsFor: 'not-counted', minutes: 0, method: null };
    if (step.kind === 'abrade') return { index, kind: 'abrade', waitsFor: 'abrade', minutes: abradeMin, method: null };
    const adjusted = adjustDryingTimes(tableFor(tables, step.productId, index).dryingTimes, tempC, {
      minApplicationTempC: tables.get(step.productId)?.minApplicationTempC,
      units,
    });
    addWarnings(warnings, adjusted.warnings);
    const isLast = index === last;
    const minutes = isLast ? adjusted.times.packMin : adjusted.times.recoatMinMin;
    return { index, kind: 'coat', waitsFor: isLast ? 'pack' : 'recoat-opens', minutes, method: adjusted.method };
  });
  return { totalMin: perStep.reduce((sum, step) => sum + step.minutes, 0), perStep, warnings };
}

function tableFor(tables: ReadonlyMap<number, ProductDryingTable>, productId: number, index: number): ProductDryingTable {
  const table = tables.get(productId);
  if (!table) throw new FinishingInputError(`steps.${index}.productId`, 'This step names a product whose drying times are not known');
  return table;
}

/** Two coats of one product give the same warning twice; it is shown once. */
function addWarnings(into: FinishingWarning[], more: FinishingWarning[]): void {
  for (const warning of more) {
    if (!into.some((w) => w.code === warning.code && w.message === warning.message)) into.push(warning);
  }
}
