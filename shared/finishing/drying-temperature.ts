import { requireFinite } from './validate';

/**
 * The temperature a coat dries at: a heated rack's when every part goes onto one (the coolest of
 * them, so no part is promised more than its rack gives), else the coat's air temperature.
 * `rackTempsC` has one entry per part: its rack's drying temperature, or null for an unheated
 * rack or no rack at all.
 */
export function coatDryingTempC(rackTempsC: readonly (number | null)[], airTempC: number): number {
  requireFinite('airTempC', airTempC, 'the air temperature');
  const heated = rackTempsC.filter((t): t is number => t !== null);
  return rackTempsC.length > 0 && heated.length === rackTempsC.length ? Math.min(...heated) : airTempC;
}
