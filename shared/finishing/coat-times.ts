import type { DryingTimes } from './drying-times';
import { requireFinite, requireInstant } from './validate';

export type CoatInstants = {
  flashOffEndsAt: Date;
  recoatOpensAt: Date;
  /** null: the product has no latest recoat time, so the window never closes. */
  recoatClosesAt: Date | null;
  touchDryAt: Date;
  handleAt: Date;
  packAt: Date;
  fullCureAt: Date;
};

const msPerMinute = 60_000;

// Drying runs on elapsed time, not on the wall clock, so adding milliseconds to the instant
// stays right across a clock change: a 3-hour wait is 3 hours even on the night clocks go back.
function after(start: Date, minutes: number, field: string): Date {
  requireFinite(field, minutes, 'the drying time');
  return new Date(start.getTime() + minutes * msPerMinute);
}

/** The instants a coat passes each drying stage, from when it was sprayed and its (temperature-adjusted) times. */
export function coatTimes(sprayedAt: Date, times: DryingTimes): CoatInstants {
  requireInstant('sprayedAt', sprayedAt, 'when the coat was sprayed');
  return {
    flashOffEndsAt: after(sprayedAt, times.flashOffMin, 'flashOffMin'),
    recoatOpensAt: after(sprayedAt, times.recoatMinMin, 'recoatMinMin'),
    recoatClosesAt: times.recoatMaxMin === null ? null : after(sprayedAt, times.recoatMaxMin, 'recoatMaxMin'),
    touchDryAt: after(sprayedAt, times.touchDryMin, 'touchDryMin'),
    handleAt: after(sprayedAt, times.handleMin, 'handleMin'),
    packAt: after(sprayedAt, times.packMin, 'packMin'),
    fullCureAt: after(sprayedAt, times.fullCureH * 60, 'fullCureH'),
  };
}
