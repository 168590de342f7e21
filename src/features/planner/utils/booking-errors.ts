import { isApiError } from '../../../lib/api-client';

/**
 * Outside opening hours the server refuses until a lead gives a reason; a clash with another
 * booking or a busy sprayer never can be. Both answer 409 "conflict", so the words tell them apart
 * (the server ends the overridable one with "…book it anyway with a reason").
 */
export function needsOverrideReason(error: unknown): boolean {
  return isApiError(error) && error.status === 409 && /anyway with a reason/i.test(error.message);
}
