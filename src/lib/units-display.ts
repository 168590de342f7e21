import type { UnitSystem } from '../../shared/schemas/common';
import { displayDigits, formatQuantity as formatSharedQuantity, toDisplay, unitSymbol, type Quantity } from '../../shared/units';

/**
 * Display helpers for tables and summaries, built on the tested conversions in shared/units.ts.
 * Values are stored (and, in this first slice, entered) in SI.
 */
type DisplayQuantity = Quantity | 'areaRate';

export function formatNumber(value: number, maximumFractionDigits = 1): string {
  return new Intl.NumberFormat('en-GB', { maximumFractionDigits }).format(value);
}

/** "12.5 m³" or "441 ft³". A spray rate is an area per hour, so it converts as an area. */
export function formatQuantity(quantity: DisplayQuantity, valueSi: number, units: UnitSystem): string {
  if (quantity === 'areaRate') {
    const shown = toDisplay(valueSi, 'area', units);
    return `${formatNumber(shown, displayDigits('area', units))} ${unitSymbol('area', units)}/h`;
  }
  return formatSharedQuantity(valueSi, quantity, units);
}
