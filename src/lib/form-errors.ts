import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { fieldErrorsOf, isApiError } from './api-client';

/**
 * Puts a server's validation messages on the matching form fields and returns what is left to show
 * above the form (null when every message found its field).
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): string | null {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  const fieldErrors = fieldErrorsOf(error);
  let unmapped = false;
  let mapped = false;
  for (const [field, messages] of Object.entries(fieldErrors)) {
    if (messages.length === 0) continue;
    if ((fields as readonly string[]).includes(field)) {
      setError(field as Path<T>, { type: 'server', message: messages[0] });
      mapped = true;
    } else {
      unmapped = true;
    }
  }
  if (mapped && !unmapped) return null;
  return error.message;
}
