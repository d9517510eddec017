import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiRequestError } from './api-client';

type Detail = { path?: string; message?: string };

/**
 * Puts the server's field errors (`details: [{ path: 'body.password', message }]`) onto the form's own
 * fields and returns the message to show for the form as a whole, or null when every error found a field.
 */
export function applyServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, fields: readonly Path<T>[]): string | null {
  if (!(err instanceof ApiRequestError)) return 'The request did not reach the server. Check your connection and try again.';
  const details = Array.isArray(err.details) ? (err.details as Detail[]) : [];
  let placed = false;
  for (const d of details) {
    const field = d.path?.replace(/^body\./, '') as Path<T> | undefined;
    if (field && fields.includes(field) && d.message) {
      setError(field, { type: 'server', message: d.message });
      placed = true;
    }
  }
  return placed ? null : err.message;
}
