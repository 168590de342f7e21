import { FinishingInputError } from '../../../../shared/errors';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { displayDigits, fromDisplay, toDisplay, type Quantity } from '../../../../shared/units';

// The calculator keeps what the user typed as text, in their own units, and converts to the
// stored (SI) units only to call the shared finishing maths.

/** A starting value shown in the user's units, rounded the way it would be displayed. */
export function startText(siValue: number, quantity: Quantity | null, units: UnitSystem): string {
  if (quantity === null) return String(siValue);
  const shown = toDisplay(siValue, quantity, units);
  return String(Number(shown.toFixed(displayDigits(quantity, units))));
}

/** Text to number; a decimal comma is accepted, and an empty box is NaN so the maths names the field. */
export function readNumber(text: string): number {
  const cleaned = text.trim().replace(',', '.');
  return cleaned === '' ? Number.NaN : Number(cleaned);
}

export function readSi(text: string, quantity: Quantity, units: UnitSystem): number {
  return fromDisplay(readNumber(text), quantity, units);
}

/** For limits the user may leave out: an empty box means "not given". */
export function readOptionalSi(text: string, quantity: Quantity | null, units: UnitSystem): number | null {
  if (text.trim() === '') return null;
  return quantity === null ? readNumber(text) : readSi(text, quantity, units);
}

export type Outcome<T> = { ok: true; value: T } | { ok: false; field: string; message: string };

/** Runs a calculation; an input the maths refuses becomes a message for that field instead of a crash. */
export function attempt<T>(compute: () => T): Outcome<T> {
  try {
    return { ok: true, value: compute() };
  } catch (error) {
    if (error instanceof FinishingInputError) return { ok: false, field: error.field, message: error.message };
    throw error;
  }
}

/** The first message for each field across several calculations. */
export function fieldErrors(...outcomes: Outcome<unknown>[]): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const outcome of outcomes) {
    if (!outcome.ok && !(outcome.field in errors)) errors[outcome.field] = outcome.message;
  }
  return errors;
}

export function formatPercent(value: number, digits = 1): string {
  return `${new Intl.NumberFormat('en-GB', { maximumFractionDigits: digits }).format(value)} %`;
}

export function formatMinutes(minutes: number): string {
  return `${new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1, minimumFractionDigits: 1 }).format(minutes)} min`;
}
