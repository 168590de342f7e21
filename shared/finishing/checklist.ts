import type { Checklist } from '../schemas/checklist';
import type { CautionProduct } from './cautions';
import { respiratorLevel } from './cautions';
import { assessConditions, worstVerdict, type Verdict } from './conditions';
import type { FitnessFinding } from './fitness';
import { respiratorWords } from '../words';

export type ChecklistProduct = CautionProduct & { minApplicationTempC: number | null; maxRelativeHumidityPct: number | null };
/** `notes` are readings within their limits but close to them: information, not problems. */
export type ChecklistEvaluation = { verdict: Verdict; problems: string[]; notes: string[] };

const respiratorRank = { particulate: 0, 'vapour-and-particulate': 1, 'air-fed': 2 } as const;

/** The strictest limits of all the products to be sprayed: highest minimum temperature, lowest maximum RH. */
function strictestLimits(products: ChecklistProduct[]) {
  const mins = products.map((p) => p.minApplicationTempC).filter((v): v is number => v !== null);
  const maxes = products.map((p) => p.maxRelativeHumidityPct).filter((v): v is number => v !== null);
  return { minApplicationTempC: mins.length ? Math.max(...mins) : null, maxRelativeHumidityPct: maxes.length ? Math.min(...maxes) : null };
}

function equipmentProblems(checklist: Checklist, minFaceVelocityMps: number, products: ChecklistProduct[]): string[] {
  const problems: string[] = [];
  if (!checklist.extractionRunning) problems.push('Extraction is not running.');
  if (!checklist.filtersChecked) problems.push('The filters have not been checked.');
  if (checklist.faceVelocityMps === null) problems.push('The face velocity has not been measured.');
  else if (checklist.faceVelocityMps < minFaceVelocityMps) problems.push(`Face velocity ${checklist.faceVelocityMps.toFixed(2)} m/s is below the booth's minimum of ${minFaceVelocityMps.toFixed(2)} m/s.`);
  const needed = respiratorLevel(products);
  if (!checklist.respiratorFitted) problems.push('Respiratory protection is not fitted.');
  else if (respiratorRank[checklist.respiratorKind] < respiratorRank[needed]) problems.push(`These products need ${respiratorWords[needed]}; ${respiratorWords[checklist.respiratorKind]} is not enough.`);
  return problems;
}

/**
 * Go / caution / stop for starting to spray: every equipment problem is a stop, conditions give
 * their own verdict, and a fit-to-spray stop (booth upkeep or the sprayer's records lapsed, see
 * fitness.ts) is a stop like any other. Fit-to-spray cautions are shown beside the checks, not here.
 */
export function evaluateChecklist(checklist: Checklist, booth: { minFaceVelocityMps: number }, products: ChecklistProduct[], fitness: FitnessFinding[] = []): ChecklistEvaluation {
  const equipment = [...equipmentProblems(checklist, booth.minFaceVelocityMps, products), ...fitness.filter((f) => f.severity === 'stop').map((f) => f.message)];
  const conditions = assessConditions({ airTempC: checklist.airTempC, relativeHumidityPct: checklist.relativeHumidityPct, surfaceTempC: checklist.surfaceTempC, ...strictestLimits(products) });
  const conditionProblems = conditions.checks.filter((c) => c.verdict !== 'go').map((c) => c.message);
  const notes = conditions.checks.filter((c) => c.info).map((c) => c.message);
  const verdict = worstVerdict([equipment.length ? 'stop' : 'go', conditions.verdict]);
  return { verdict, problems: [...equipment, ...conditionProblems], notes };
}
