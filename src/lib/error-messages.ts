import { isApiError, type ApiErrorCode } from './api-client';

/** Words for people, by error code. The server's own message is used where it says more. */
const wordsByCode: Record<ApiErrorCode, string> = {
  bad_request: 'That request was not understood. Check the form and try again.',
  validation_failed: 'Some fields need attention.',
  unauthenticated: 'Your sign-in has ended. Sign in again to carry on.',
  forbidden: 'Your role does not allow this. Ask the owner if you need it.',
  csrf_invalid: 'The page was open too long to send that safely. Reload the page and try again.',
  not_found: 'That record no longer exists. It may have been removed.',
  conflict: 'That clashes with something already saved.',
  outside_opening_hours: 'That is outside the booth’s opening hours.',
  rack_space: 'The racks would be full before the parts can be handled.',
  too_many_requests: 'Too many attempts in a short time. Wait a minute, then try again.',
  payload_too_large: 'That is too large to send.',
  internal: 'Something went wrong on our side. Try again; if it keeps happening, tell the owner.',
  network: 'Could not reach Boothwright. Check the connection and try again.',
  bad_response: 'The server sent an answer the app could not read. Reload the page and try again.',
};

/** Codes where the server's message is specific and worth showing as it is. */
const serverWordsPreferred = new Set<ApiErrorCode>(['unauthenticated', 'conflict', 'outside_opening_hours', 'rack_space', 'not_found', 'validation_failed', 'bad_request', 'forbidden', 'too_many_requests']);

export function errorMessage(error: unknown): string {
  if (isApiError(error)) {
    if (serverWordsPreferred.has(error.code) && error.message) return error.message;
    return wordsByCode[error.code];
  }
  return wordsByCode.internal;
}
