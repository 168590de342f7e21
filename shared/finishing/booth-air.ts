import { requireBetween, requirePositive, requireShare } from './validate';

export type ClearanceInput = {
  volumeM3: number;
  extractionM3PerH: number;
  /** 1 = perfectly mixed air; real booths and rooms sit between about 1 and 10 (default 3). */
  mixingFactorK: number;
  /** Fraction of the starting vapour concentration to purge down to; 0.01 = 1 %. */
  targetFraction?: number;
};

/**
 * Minutes for a well-mixed purge to bring vapour down to `targetFraction` of its starting
 * level once spraying stops: ln(C2/C1) = −(Q′/V)·t with Q′ = Q/K, so t = K·V/Q·ln(1/target).
 * It is a lower bound; a booth's measured (smoke-tested) clearance time always wins.
 */
export function clearanceTimeMin({ volumeM3, extractionM3PerH, mixingFactorK, targetFraction = 0.01 }: ClearanceInput): number {
  requirePositive('volumeM3', volumeM3, 'the booth volume');
  requirePositive('extractionM3PerH', extractionM3PerH, 'the extraction rate');
  requireBetween('mixingFactorK', mixingFactorK, 'the mixing factor K', 1, 10);
  requireShare('targetFraction', targetFraction, 'the target fraction', 1);
  const hours = ((mixingFactorK * volumeM3) / extractionM3PerH) * Math.log(1 / targetFraction);
  return hours * 60;
}

export type EffectiveClearance = { minutes: number; source: 'measured' | 'computed'; computedMinutes: number };

/** The clearance time to show: the measured one when the booth has been tested, else the computed lower bound. */
export function effectiveClearance(input: ClearanceInput & { measuredClearanceMin: number | null | undefined }): EffectiveClearance {
  const { measuredClearanceMin, ...computedInput } = input;
  const computedMinutes = clearanceTimeMin(computedInput);
  if (measuredClearanceMin != null) {
    requirePositive('measuredClearanceMin', measuredClearanceMin, 'the measured clearance time');
    return { minutes: measuredClearanceMin, source: 'measured', computedMinutes };
  }
  return { minutes: computedMinutes, source: 'computed', computedMinutes };
}

/** Average air speed through the open face, to set against the booth's minimum face velocity. */
export function faceVelocityMps({ extractionM3PerH, openFaceAreaM2 }: { extractionM3PerH: number; openFaceAreaM2: number }): number {
  requirePositive('extractionM3PerH', extractionM3PerH, 'the extraction rate');
  requirePositive('openFaceAreaM2', openFaceAreaM2, 'the open-face area');
  return extractionM3PerH / 3600 / openFaceAreaM2;
}
