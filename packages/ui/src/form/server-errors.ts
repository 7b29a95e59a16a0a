import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '../api-client.ts';

/**
 * Puts a failed request's messages where the person looks: each server `fields` entry next to
 * its input, and the overall message in the form's alert.
 */
export function showServerError<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: ReadonlyArray<Path<T>>,
) {
  if (error instanceof ApiError && error.fields) {
    for (const [name, messages] of Object.entries(error.fields)) {
      const field = fieldNames.find((candidate) => candidate === name);
      if (field) setError(field, { message: messages.join(' ') });
    }
  }
  const message =
    error instanceof Error ? error.message : 'Something went wrong. Please try again.';
  setError('root.server', { message });
}
