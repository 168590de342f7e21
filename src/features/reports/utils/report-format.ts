import type { UnitSystem } from '../../../../shared/schemas/common';
import { reworkReasonLabels, reworkReasons, type ReworkReason } from '../../../../shared/schemas/report';
import { formatQuantity, gramsToPounds, toDisplay, unitSymbol, type Quantity } from '../../../../shared/units';
import { formatNumber } from '../../../lib/units-display';

/** Figures as the user reads them (°F, ft², US gal for US users); CSV and the API stay in SI. */
export const shown = (si: number, quantity: Quantity, units: UnitSystem) => Number(toDisplay(si, quantity, units).toFixed(2));
export const symbolOf = (quantity: Quantity, units: UnitSystem) => unitSymbol(quantity, units);
export const quantityWords = (si: number, quantity: Quantity, units: UnitSystem) => formatQuantity(si, quantity, units);

export const hoursWords = (hours: number) => `${formatNumber(hours, 1)} h`;
export const litresWords = (litres: number, units: UnitSystem) => formatQuantity(litres, 'liquidVolume', units);
export const areaWords = (m2: number, units: UnitSystem) => formatQuantity(m2, 'area', units);

/** A share as whole percent, or a dash when there is nothing to divide by. */
export function percentWords(part: number, whole: number): string {
  if (whole <= 0) return '–';
  return `${formatNumber((part / whole) * 100, 0)} %`;
}

/** VOC mass: kilograms, or pounds for US users (as the job estimates show it). */
export const vocUnit = (units: UnitSystem) => (units === 'us' ? 'lb' : 'kg');
const vocInUnit = (kg: number, units: UnitSystem) => (units === 'us' ? gramsToPounds(kg * 1000) : kg);
/** For chart values; words round once, from the unrounded figure. */
export const vocShown = (kg: number, units: UnitSystem) => Number(vocInUnit(kg, units).toFixed(2));
export const vocWords = (kg: number, units: UnitSystem) => `${formatNumber(vocInUnit(kg, units), 1)} ${vocUnit(units)}`;

export const capitalised = (text: string) => (text ? text[0].toUpperCase() + text.slice(1) : text);
const isReworkReason = (reason: string): reason is ReworkReason => (reworkReasons as readonly string[]).includes(reason);

export const reworkKindWords = { corrected: 'Record corrected', repeated: 'Re-sprayed' } as const;

/** A re-spray's reason by its label; a correction's reason as the person typed it. */
export function reworkReasonWords(kind: keyof typeof reworkKindWords, reason: string): string {
  if (kind === 'repeated') return isReworkReason(reason) ? reworkReasonLabels[reason] : capitalised(reason) || 'No reason given';
  return capitalised(reason) || 'No reason given';
}
