import { dewPointC } from '../../shared/finishing/conditions';
import { adjustDryingTimes, type DryingMethod, type DryingTimes } from '../../shared/finishing/drying-times';
import type { BenchCoatStep } from './base-shop';

export interface Conditions {
  airTempC: number;
  relativeHumidityPct: number;
  surfaceTempC: number;
  dewPointC: number;
}

const round1 = (n: number) => Math.round(n * 10) / 10;

/** Booth air over the year: cooler and damper in winter, with a little noise from `random`. */
export function boothConditions(yearFraction: number, random: () => number): Conditions {
  const season = Math.cos(2 * Math.PI * (yearFraction - 0.55));
  const airTempC = round1(19 + 3 * season + (random() - 0.5) * 2);
  const relativeHumidityPct = round1(55 - 10 * season + (random() - 0.5) * 10);
  const surfaceTempC = round1(airTempC - 0.5 - random());
  return { airTempC, relativeHumidityPct, surfaceTempC, dewPointC: dewPointC(airTempC, relativeHumidityPct) };
}

export interface CoatOffsets {
  method: DryingMethod;
  /** Milliseconds after spraying for each instant of coatTimes (shared/finishing/coat-times.ts). */
  flashOffMs: number;
  recoatOpensMs: number;
  recoatClosesMs: number | null;
  touchDryMs: number;
  handleMs: number;
  packMs: number;
  fullCureMs: number;
}

function offsetsOf(times: DryingTimes, method: DryingMethod): CoatOffsets {
  const ms = (minutes: number) => minutes * 60_000;
  return {
    method,
    flashOffMs: ms(times.flashOffMin),
    recoatOpensMs: ms(times.recoatMinMin),
    recoatClosesMs: times.recoatMaxMin === null ? null : ms(times.recoatMaxMin),
    touchDryMs: ms(times.touchDryMin),
    handleMs: ms(times.handleMin),
    packMs: ms(times.packMin),
    fullCureMs: ms(times.fullCureH * 60),
  };
}

/**
 * Temperature-adjusted drying times per product and half degree, worked out once each by the
 * app's own maths; a million coats then only add offsets to their spraying time.
 */
export function createCoatOffsets() {
  const cache = new Map<number, CoatOffsets>();
  return (step: BenchCoatStep, dryingTempC: number): CoatOffsets => {
    const halfDegrees = Math.round(dryingTempC * 2);
    const key = step.productId * 1000 + halfDegrees;
    let offsets = cache.get(key);
    if (!offsets) {
      const adjusted = adjustDryingTimes(step.dryingTimes, halfDegrees / 2);
      offsets = offsetsOf(adjusted.times, adjusted.method);
      cache.set(key, offsets);
    }
    return offsets;
  };
}
