import type { UnitSystem } from '../../../../shared/schemas/common';
import { moneyWords } from '../../../../shared/words';
import { formatQuantity } from '../../../lib/units-display';

export const litres = (valueL: number, units: UnitSystem) => formatQuantity('liquidVolume', valueL, units);

/** VOC mass: grams with kilograms under them in metric (solvent limits are set in kg), pounds in US units. */
export function vocMass(grams: number, units: UnitSystem): { main: string; kilograms: string | null } {
  if (units === 'us') return { main: formatQuantity('mass', grams, units), kilograms: null };
  const kg = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 2, maximumFractionDigits: 2 }).format(grams / 1000);
  return { main: formatQuantity('mass', grams, units), kilograms: `${kg} kg` };
}

/** How the estimate writes money: in its currency (the shop's), the way the shop's locale writes it. */
export type MoneyFormat = { currency: string; locale: string };

export const money = (amount: number, format: MoneyFormat) => moneyWords(amount, format.currency, format.locale);

export function missingDataWords(stepsWithoutVoc: number, stepsWithoutPrice: number): string[] {
  const words: string[] = [];
  const steps = (n: number) => `${n} coat ${n === 1 ? 'step has' : 'steps have'}`;
  if (stepsWithoutVoc > 0) words.push(`${steps(stepsWithoutVoc)} no VOC figure on the data sheet, so the VOC total leaves them out.`);
  if (stepsWithoutPrice > 0) words.push(`${steps(stepsWithoutPrice)} no price on the data sheet, so the cost total leaves them out.`);
  return words;
}
