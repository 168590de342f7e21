import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';
import { errorMessage } from './error-messages';

/**
 * Puts the server's `fields` errors beside the fields they name. Returns the message to show
 * above the form: the server's overall message, plus any field errors with no field on screen.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly string[],
): string {
  if (!isApiError(error) || Object.keys(error.fields).length === 0) return errorMessage(error);
  const unplaced: string[] = [];
  for (const [path, message] of Object.entries(error.fields)) {
    const root = path.split('.')[0];
    if (fieldNames.includes(root)) {
      setError(path as Path<T>, { type: 'server', message }, { shouldFocus: unplaced.length === 0 });
    } else {
      unplaced.push(message);
    }
  }
  return [errorMessage(error), ...unplaced].join(' ');
}
