import { isApiError } from '../../../lib/api-client';

/**
 * Outside opening hours the server refuses until a lead gives a reason (409 with code
 * `outside_opening_hours`); a clash with another booking or a busy sprayer (409 `conflict`)
 * never can be overridden.
 */
export function needsOverrideReason(error: unknown): boolean {
  return isApiError(error) && error.status === 409 && error.code === 'outside_opening_hours';
}
