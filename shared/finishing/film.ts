import { requireBetween, requirePositive, requireShare } from './validate';

// Thinner adds volume but no solids, so the solids fraction of what is sprayed is
// VS / (100 + t) where t is the thinning in % by volume of the paint as supplied.

export type FilmSolids = { volumeSolidsPct: number; thinningPct?: number };

function checkSolids({ volumeSolidsPct, thinningPct = 0 }: FilmSolids): { vs: number; thinning: number } {
  requireShare('volumeSolidsPct', volumeSolidsPct, 'the volume solids');
  requireBetween('thinningPct', thinningPct, 'the thinning', 0, 200);
  return { vs: volumeSolidsPct, thinning: thinningPct };
}

/** Volume solids of the paint once thinned by `thinningPct` % by volume. */
export function thinnedVolumeSolidsPct(input: FilmSolids): number {
  const { vs, thinning } = checkSolids(input);
  return (vs * 100) / (100 + thinning);
}

/** Dry film expected from a wet-film (comb) reading: DFT = WFT × VS / (100 + t). */
export function dryFilmUm(input: FilmSolids & { wetFilmUm: number }): number {
  requirePositive('wetFilmUm', input.wetFilmUm, 'the wet film');
  const { vs, thinning } = checkSolids(input);
  return (input.wetFilmUm * vs) / (100 + thinning);
}

/** Wet film to aim for at the gun to end with `dryFilmUm`: WFT = DFT × (100 + t) / VS. */
export function wetFilmTargetUm(input: FilmSolids & { dryFilmUm: number }): number {
  requirePositive('dryFilmUm', input.dryFilmUm, 'the dry film');
  const { vs, thinning } = checkSolids(input);
  return (input.dryFilmUm * (100 + thinning)) / vs;
}

/**
 * Area one litre of the paint as supplied covers at `dryFilmUm` with nothing lost:
 * m²/L = VS × 10 / DFT. Thinning does not change it (thinner carries no solids). Not
 * meaningful for a first coat on bare wood or MDF, which soaks some of it up.
 */
export function theoreticalSpreadingRateM2PerL({ volumeSolidsPct, dryFilmUm }: { volumeSolidsPct: number; dryFilmUm: number }): number {
  requireShare('volumeSolidsPct', volumeSolidsPct, 'the volume solids');
  requirePositive('dryFilmUm', dryFilmUm, 'the dry film');
  return (volumeSolidsPct * 10) / dryFilmUm;
}

/**
 * ±20 % of the target dry film counts as on target. Common practice in the trade (the
 * figure is from memory, not a published wood-finishing standard); a data sheet's own
 * range wins when it gives one.
 */
export const filmTolerancePct = 20;

export type FilmVerdict = 'thin' | 'on-target' | 'heavy';

export function filmVerdict(measuredDryUm: number, targetDryUm: number, tolerancePct: number = filmTolerancePct): FilmVerdict {
  requirePositive('measuredDryUm', measuredDryUm, 'the measured dry film');
  requirePositive('targetDryUm', targetDryUm, 'the target dry film');
  requireBetween('tolerancePct', tolerancePct, 'the tolerance', 0, 100);
  const band = (targetDryUm * tolerancePct) / 100;
  if (measuredDryUm < targetDryUm - band) return 'thin';
  if (measuredDryUm > targetDryUm + band) return 'heavy';
  return 'on-target';
}
