import { FinishingInputError } from '../errors';
import { theoreticalSpreadingRateM2PerL } from './film';
import { requireBetween, requireNonNegative, requirePositive, requireShare } from './validate';

export const sprayMethodIds = ['conventional', 'hvlp', 'airless', 'air-assisted-airless', 'electrostatic'] as const;
export type SprayMethod = (typeof sprayMethodIds)[number];

/**
 * Default transfer efficiency (% of the solids sprayed that stay on the part). Common
 * practice defaults, each shop edits them: published figures vary widely with part size
 * and the sprayer's skill.
 */
export const sprayMethods: Record<SprayMethod, { label: string; transferEfficiencyPct: number }> = {
  conventional: { label: 'Conventional air spray', transferEfficiencyPct: 30 },
  hvlp: { label: 'HVLP', transferEfficiencyPct: 60 },
  airless: { label: 'Airless', transferEfficiencyPct: 45 },
  'air-assisted-airless': { label: 'Air-assisted airless', transferEfficiencyPct: 65 },
  electrostatic: { label: 'Electrostatic', transferEfficiencyPct: 75 },
};

export type LitresNeededInput = {
  areaM2: number;
  coats: number;
  dryFilmUm: number;
  volumeSolidsPct: number;
  transferEfficiencyPct: number;
};

/**
 * Litres of paint as supplied (before thinner, which carries no solids) to build `dryFilmUm`
 * per coat over `areaM2`, allowing for overspray: area × coats / (spreading rate × TE).
 */
export function litresNeeded({ areaM2, coats, dryFilmUm, volumeSolidsPct, transferEfficiencyPct }: LitresNeededInput): number {
  requirePositive('areaM2', areaM2, 'the area');
  requirePositive('coats', coats, 'the number of coats');
  if (!Number.isInteger(coats)) throw new FinishingInputError('coats', 'Enter a whole number of coats');
  requireShare('transferEfficiencyPct', transferEfficiencyPct, 'the transfer efficiency');
  const spreadingRate = theoreticalSpreadingRateM2PerL({ volumeSolidsPct, dryFilmUm });
  return (areaM2 * coats) / (spreadingRate * (transferEfficiencyPct / 100));
}

export type MixInput = {
  wantedL: number;
  /** Parts by volume, e.g. { base: 4, hardener: 1 }; hardener 0 for a one-pack product. */
  ratio: { base: number; hardener: number };
  thinningPct: number;
  /** Whether the thinning % is measured against base + hardener ('on-mix') or the base alone ('on-base'). */
  thinnerBasis: 'on-mix' | 'on-base';
};

export type MixQuantities = { baseL: number; hardenerL: number; thinnerL: number; totalL: number };

/**
 * Litres of each component for a pot of `wantedL`. The three always add up to `wantedL`;
 * the basis only decides what the thinning % is a share of.
 */
export function mixQuantities({ wantedL, ratio, thinningPct, thinnerBasis }: MixInput): MixQuantities {
  requirePositive('wantedL', wantedL, 'the amount wanted');
  requirePositive('ratio.base', ratio.base, 'the base part of the ratio');
  requireNonNegative('ratio.hardener', ratio.hardener, 'the hardener part of the ratio');
  requireBetween('thinningPct', thinningPct, 'the thinning', 0, 200);
  const hardenerPerBase = ratio.hardener / ratio.base;
  const thinnerPerBase =
    thinnerBasis === 'on-mix' ? ((1 + hardenerPerBase) * thinningPct) / 100 : thinningPct / 100;
  const baseL = wantedL / (1 + hardenerPerBase + thinnerPerBase);
  const [hardenerL, thinnerL] = [baseL * hardenerPerBase, baseL * thinnerPerBase];
  return { baseL, hardenerL, thinnerL, totalL: baseL + hardenerL + thinnerL };
}

/** Grams of VOC released by `litres` of ready-to-spray material at `vocGPerL` (as applied). */
export function vocGrams({ litres, vocGPerL }: { litres: number; vocGPerL: number }): number {
  requireNonNegative('litres', litres, 'the litres used');
  requireBetween('vocGPerL', vocGPerL, 'the VOC content', 0, 2000);
  return litres * vocGPerL;
}
