import { ApiRequestError } from '../../../lib/api-client';

/** Where a server-side problem belongs in the record form: a field path, or null for the form as a whole. */
export function formPathOf(apiPath: string): string | null {
  const path = apiPath.replace(/^body\.?/, '');
  if (path === '' ) return null;
  if (path === 'compoundId' || path.startsWith('structure')) return 'structure';
  if (path.startsWith('eluent.steps')) return 'eluent.steps';
  if (path.startsWith('visualisation')) return path.endsWith('.note') ? 'otherVisualisation' : 'visualisation';
  if (/^spots\.\d+$/.test(path)) return `${path}.rf`;
  return path;
}

/**
 * Turns an API error into field errors (from `details[].path`) and a message for the form as a whole.
 * Structure errors from the chemistry engine (codes such as smiles_syntax, valence) go on the structure.
 */
export function mapServerErrors(error: unknown): { fields: { path: string; message: string }[]; formMessage: string | null } {
  if (!(error instanceof ApiRequestError)) return { fields: [], formMessage: error instanceof Error ? error.message : 'Something went wrong.' };
  if (Array.isArray(error.details)) {
    const fields = (error.details as { path?: string; message?: string }[])
      .map((detail) => ({ path: formPathOf(detail.path ?? ''), message: detail.message ?? error.message }))
      .filter((field): field is { path: string; message: string } => field.path !== null);
    return { fields, formMessage: fields.length === 0 ? error.message : null };
  }
  if (/^(structure|smiles|molfile|sdf|valence|aromaticity|pseudo)/.test(error.code)) return { fields: [{ path: 'structure', message: error.message }], formMessage: null };
  return { fields: [], formMessage: error.message };
}
