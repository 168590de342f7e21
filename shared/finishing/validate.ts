import { FinishingInputError } from '../errors';

// Each guard names the input field so the API can point the user at the box to fix.
// `what` is the phrase a sprayer would use for the value ("the wet film").

function capitalise(what: string): string {
  return what.charAt(0).toUpperCase() + what.slice(1);
}

export function requireFinite(field: string, value: number, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new FinishingInputError(field, `Enter ${what} as a number`);
  }
  return value;
}

export function requirePositive(field: string, value: number, what: string): number {
  requireFinite(field, value, what);
  if (value <= 0) throw new FinishingInputError(field, `${capitalise(what)} must be more than 0`);
  return value;
}

export function requireNonNegative(field: string, value: number, what: string): number {
  requireFinite(field, value, what);
  if (value < 0) throw new FinishingInputError(field, `${capitalise(what)} cannot be negative`);
  return value;
}

/** Inclusive at both ends. */
export function requireBetween(field: string, value: number, what: string, min: number, max: number): number {
  requireFinite(field, value, what);
  if (value < min || value > max) {
    throw new FinishingInputError(field, `${capitalise(what)} must be between ${min} and ${max}`);
  }
  return value;
}

export function requireInstant(field: string, value: Date, what: string): Date {
  if (!(value instanceof Date) || Number.isNaN(value.getTime())) {
    throw new FinishingInputError(field, `Enter ${what} as a date and time`);
  }
  return value;
}

/** More than 0 and at most `max`: for shares such as volume solids or transfer efficiency. */
export function requireShare(field: string, value: number, what: string, max = 100): number {
  requireFinite(field, value, what);
  if (value <= 0 || value > max) {
    throw new FinishingInputError(field, `${capitalise(what)} must be more than 0 and at most ${max}`);
  }
  return value;
}
