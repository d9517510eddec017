import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiRequestError } from './api-client';

export interface ServerErrorParts {
  /** Problems that belong to a field of the form, by the form's own field path. */
  fields: { path: string; message: string }[];
  /** The message for the form as a whole, or null when every problem found a field. */
  formMessage: string | null;
}

/**
 * Reads the server's problems (`details: [{ path: 'body.password', message }]`) as form fields: `fieldOf` turns an
 * API path into the form's field path, or null when the problem belongs to the form as a whole.
 */
export function serverErrorParts(err: unknown, fieldOf: (apiPath: string) => string | null): ServerErrorParts {
  if (!(err instanceof ApiRequestError)) {
    return { fields: [], formMessage: 'The request did not reach the server. Check your connection and try again.' };
  }
  const fields = err.details
    .map((detail) => ({ path: fieldOf(detail.path), message: detail.message || err.message }))
    .filter((field): field is { path: string; message: string } => field.path !== null);
  return { fields, formMessage: fields.length === 0 ? err.message : null };
}

/** Puts the server's field errors onto the form's own fields; returns the message for the form as a whole. */
export function applyServerErrors<T extends FieldValues>(
  err: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): string | null {
  const known = (apiPath: string) => {
    const field = apiPath.replace(/^body\./, '');
    return fields.includes(field as Path<T>) ? field : null;
  };
  const parts = serverErrorParts(err, known);
  for (const field of parts.fields) setError(field.path as Path<T>, { type: 'server', message: field.message });
  return parts.formMessage;
}
