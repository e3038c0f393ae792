import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client.ts';

/**
 * Puts a failed request's field problems onto the form fields they name and returns the
 * message to show for the whole form (anything no field can carry).
 */
export function applyServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fieldNames: readonly Path<T>[]): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  let unplaced = false;
  for (const issue of error.fields) {
    const name = fieldNames.find((f) => f === issue.path);
    if (name) setError(name, { type: 'server', message: issue.message });
    else unplaced = true;
  }
  if (error.fields.length > 0 && !unplaced) return '';
  return error.message;
}
