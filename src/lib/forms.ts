import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';

/** Shows the server's per-field messages beside the fields; returns the overall message for a banner. */
export function applyServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>): string {
  if (error instanceof ApiError) {
    for (const [field, message] of Object.entries(error.fields)) {
      setError(field as Path<T>, { type: 'server', message });
    }
    return error.message;
  }
  return 'Something went wrong. Try again.';
}
