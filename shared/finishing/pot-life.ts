import { scaleByTenDegreeRule } from './drying-times';
import { requireFinite, requireInstant, requireNonNegative, requirePositive } from './validate';
import { FinishingInputError } from '../errors';

export type MixTimesInput = {
  mixedAt: Date;
  /** Stand time after mixing before the pot may be used, at `refTempC`; 0 if none. */
  inductionMin: number;
  /** Usable life from mixing, at `refTempC`. */
  potLifeMin: number;
  refTempC: number;
  /** Temperature of the mixed material. */
  tempC: number;
};

export type MixTimes = {
  inductionEndsAt: Date;
  potLifeEndsAt: Date;
  /** Shops warn at 80 % of pot life so a part-used pot is not sprayed at its very end. */
  potLifeWarningAt: Date;
  isEstimate: true;
  note: string;
};

const potLifeWarningShare = 0.8;

/**
 * When the pot may be used and when it must be finished. Both are scaled from the data
 * sheet by the 10 °C doubling rule, so they are estimates: a large or warm batch gels sooner.
 */
export function mixTimes({ mixedAt, inductionMin, potLifeMin, refTempC, tempC }: MixTimesInput): MixTimes {
  requireInstant('mixedAt', mixedAt, 'when the pot was mixed');
  requireNonNegative('inductionMin', inductionMin, 'the induction time');
  requirePositive('potLifeMin', potLifeMin, 'the pot life');
  requireFinite('refTempC', refTempC, 'the data sheet temperature');
  requireFinite('tempC', tempC, 'the material temperature');
  if (inductionMin >= potLifeMin) {
    throw new FinishingInputError('inductionMin', 'The induction time must be shorter than the pot life');
  }
  const at = (minutes: number) => new Date(mixedAt.getTime() + minutes * 60_000);
  const potLife = scaleByTenDegreeRule(potLifeMin, refTempC, tempC);
  return {
    inductionEndsAt: at(scaleByTenDegreeRule(inductionMin, refTempC, tempC)),
    potLifeEndsAt: at(potLife),
    potLifeWarningAt: at(potLife * potLifeWarningShare),
    // Even at the data sheet's temperature pot life is a laboratory figure for a small batch.
    isEstimate: true,
    note:
      refTempC === tempC
        ? 'Estimate: data sheet times. A large or warm batch can gel sooner.'
        : 'Estimate: data sheet times scaled by the rule that they halve for every 10 °C warmer. A large or warm batch can gel sooner.',
  };
}

/** The temperature a data sheet quotes pot life at: its drying-times row nearest 20 °C. A sheet with no rows gives none. */
export function potLifeReferenceTempC(dryingTimes: readonly { tempC: number }[]): number {
  const nearest = [...dryingTimes].sort((a, b) => Math.abs(a.tempC - 20) - Math.abs(b.tempC - 20))[0];
  if (!nearest) throw new FinishingInputError('dryingTimes', 'The data sheet has no drying times, so the temperature its pot life is quoted at is not known');
  return nearest.tempC;
}

export type PotWarning = { code: 'pot-life-expired' | 'induction-not-over'; verdict: 'stop' | 'caution'; message: string };

/** A coat from a pot past its pot life is a stop to acknowledge; one from a pot still standing, a caution. */
export function potWarnings(mix: { inductionEndsAt: string; potLifeEndsAt: string | null }, sprayedAt: Date): PotWarning[] {
  requireInstant('sprayedAt', sprayedAt, 'when the coat was sprayed');
  const at = sprayedAt.getTime();
  if (mix.potLifeEndsAt && at > Date.parse(mix.potLifeEndsAt)) return [{ code: 'pot-life-expired', verdict: 'stop', message: 'The pot was past its pot life when this coat went on.' }];
  if (at < Date.parse(mix.inductionEndsAt)) return [{ code: 'induction-not-over', verdict: 'caution', message: 'The pot had not finished its induction (stand) time.' }];
  return [];
}
