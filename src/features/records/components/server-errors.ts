import { ApiRequestError } from '../../../lib/api-client';
import { serverErrorParts, type ServerErrorParts } from '../../../lib/form-errors';

/** Where a server-side problem belongs in the record form: a field path, or null for the form as a whole. */
function formPathOf(apiPath: string): string | null {
  const path = apiPath.replace(/^body\.?/, '');
  if (path === '') return null;
  if (path === 'compoundId' || path.startsWith('structure')) return 'structure';
  if (path.startsWith('eluent.steps')) return 'eluent.steps';
  if (path.startsWith('visualisation')) return path.endsWith('.note') ? 'otherVisualisation' : 'visualisation';
  if (/^spots\.\d+$/.test(path)) return `${path}.rf`;
  return path;
}

const STRUCTURE_CODES = /^(structure|smiles|molfile|sdf|valence|aromaticity|pseudo)/;

/**
 * Turns an API error into record-form field errors and a message for the form as a whole. Structure errors from
 * the chemistry engine (codes such as smiles_syntax, valence) go on the structure field.
 */
export function mapServerErrors(error: unknown): ServerErrorParts {
  if (error instanceof ApiRequestError && STRUCTURE_CODES.test(error.code)) {
    return { fields: [{ path: 'structure', message: error.message }], formMessage: null };
  }
  if (error instanceof ApiRequestError || !(error instanceof Error)) return serverErrorParts(error, formPathOf);
  return { fields: [], formMessage: error.message };
}
