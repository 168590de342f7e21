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
