import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError, friendlyMessage } from '../../../lib/api-client';

/**
 * Puts the server's per-field messages on the fields (dotted paths like "widthsIn.2" match
 * react-hook-form's names) and returns the message for the form as a whole, if any is left.
 */
export function applyServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, known: string[]): string | null {
  if (!(error instanceof ApiError)) return friendlyMessage(error);
  let placed = 0;
  for (const [field, messages] of Object.entries(error.fieldErrors)) {
    if (known.some((k) => field === k || field.startsWith(`${k}.`))) {
      setError(field as Path<T>, { type: 'server', message: messages[0] });
      placed++;
    }
  }
  return placed ? (error.status === 400 ? null : error.message) : friendlyMessage(error);
}
