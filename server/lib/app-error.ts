import type { ErrorCode } from '../../shared/errors';

const statusOf: Record<ErrorCode, number> = {
  bad_request: 400,
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  csrf_invalid: 403,
  not_found: 404,
  conflict: 409,
  outside_opening_hours: 409,
  rack_space: 409,
  payload_too_large: 413,
  too_many_requests: 429,
  internal: 500,
};

/** The only error services throw; the error handler turns it into the §7 envelope. */
export class AppError extends Error {
  readonly status: number;

  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
    this.status = statusOf[code];
  }
}

export const notFound = (what: string) => new AppError('not_found', `${what} was not found`);
