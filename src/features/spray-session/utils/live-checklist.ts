import { evaluateChecklist, type ChecklistEvaluation, type ChecklistProduct } from '../../../../shared/finishing/checklist';
import type { FitnessFinding } from '../../../../shared/finishing/fitness';
import { assessConditions } from '../../../../shared/finishing/conditions';
import { sensorIsStale } from '../../../../shared/finishing/day-board';
import { checklistSchema } from '../../../../shared/schemas/checklist';
import type { Reading } from '../../../../shared/schemas/reading';

interface LiveChecklist {
  evaluation: ChecklistEvaluation | null;
  missing: string[];
  dew: { dewPointC: number; surfaceMarginC: number } | null;
}

type TypedConditions = { airTempC?: number | null; relativeHumidityPct?: number | null; surfaceTempC?: number | null };

/** The dew point shows as soon as the air, humidity and surface are typed, before the rest is done. */
function dewOf(values: TypedConditions): LiveChecklist['dew'] {
  const { airTempC, relativeHumidityPct, surfaceTempC } = values;
  if (typeof airTempC !== 'number' || typeof relativeHumidityPct !== 'number' || typeof surfaceTempC !== 'number') return null;
  try {
    const { dewPointC, surfaceMarginC } = assessConditions({ airTempC, relativeHumidityPct, surfaceTempC });
    return { dewPointC, surfaceMarginC };
  } catch {
    return null;
  }
}

/** The same verdict the server will record, worked out as the sprayer fills the form in; `fitness` is null while it loads. */
export function liveChecklist(values: unknown, booth: { minFaceVelocityMps: number }, products: ChecklistProduct[] | null, fitness: FitnessFinding[] | null = []): LiveChecklist {
  const dew = dewOf((values ?? {}) as TypedConditions);
  const parsed = checklistSchema.safeParse(values);
  if (!parsed.success) return { evaluation: null, missing: [...new Set(parsed.error.issues.map((issue) => issue.message))], dew };
  if (products === null) return { evaluation: null, missing: ['The products’ data sheets are still loading.'], dew };
  if (fitness === null) return { evaluation: null, missing: ['The booth’s upkeep and the sprayer’s records are still loading.'], dew };
  try {
    return { evaluation: evaluateChecklist(parsed.data, booth, products, fitness), missing: [], dew };
  } catch (error) {
    return { evaluation: null, missing: [error instanceof Error ? error.message : 'A value is out of range.'], dew };
  }
}

/** Why "Start spraying" cannot be pressed yet, in words; null when it can. */
export function startBlockedReason(live: LiveChecklist, canOverride: boolean, overrideReason: string | null | undefined): string | null {
  if (!live.evaluation) return 'Fill in every check first.';
  if (live.evaluation.verdict !== 'stop') return null;
  if (canOverride) return (overrideReason ?? '').trim().length >= 3 ? null : 'The checks say stop. Put right what is listed, or give your reason to go ahead anyway.';
  return 'The checks say stop. Put right what is listed above; only a finishing lead can override a stop.';
}

/**
 * The booth's last reading, offered as its conditions now only while it is recent (as long as a
 * sensor counts as reporting): days-old figures say nothing about the air the coat goes into.
 */
export function currentReading(reading: Reading | null, now: Date): Reading | null {
  return reading && !sensorIsStale(new Date(reading.at), now) ? reading : null;
}
