import { ApiError, isApiError } from '../../../lib/api-client';

/** The server names nested fields ("checklist.airTempC"); the form knows them by their own names. */
export function withoutFieldPrefix(error: unknown, prefix: string): unknown {
  if (!isApiError(error)) return error;
  const fields = Object.fromEntries(Object.entries(error.fields).map(([path, message]) => [path.startsWith(prefix) ? path.slice(prefix.length) : path, message]));
  return new ApiError(error.status, error.code, error.message, fields);
}
