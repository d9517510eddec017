import { AppError } from '../http/errors';

/** Why a structure was refused; stable codes the client can map to help text. */
export type StructureErrorCode =
  | 'structure_empty'
  | 'structure_too_large'
  | 'structure_too_many_atoms'
  | 'structure_several'
  | 'smiles_syntax'
  | 'smiles_unclosed_branch'
  | 'smiles_unclosed_ring'
  | 'valence'
  | 'aromaticity'
  | 'pseudo_atom'
  | 'molfile_invalid'
  | 'sdf_several_records';

/** Where in the input the problem sits, when known (all positions and lines count from 1). */
export interface StructureErrorDetails {
  /** Character position in a SMILES string. */
  position?: number;
  /** Line of a molfile or SDF text. */
  line?: number;
  /** Atom number (1-based, in input order). */
  atom?: number;
  /** Element or token at fault. */
  token?: string;
  /** Record number in an SDF file. */
  record?: number;
}

/**
 * A structure the chemistry engine refuses. Extends the app's AppError so the error middleware
 * answers `{ error: { code, message, details } }` with `status` (400 syntax, 413 size, 422 chemistry).
 */
export class StructureError extends AppError {
  declare readonly code: StructureErrorCode;
  declare readonly details: StructureErrorDetails | undefined;

  constructor(status: 400 | 413 | 422, code: StructureErrorCode, message: string, details?: StructureErrorDetails) {
    super(status, code, message, details);
  }
}

/** Text larger than this many bytes (UTF-8) is refused before parsing (413). */
export const MAX_STRUCTURE_BYTES = 20_000;

/** Structures with more heavy (non-hydrogen) atoms than this are refused (422). */
export const MAX_HEAVY_ATOMS = 250;

/** OpenChemLib error text without its internal class prefix. */
export function cleanMessage(error: unknown): string {
  const text = error instanceof Error ? error.message : String(error);
  return text
    .replace(/^Class\$\S+:\s*/, '')
    .replace(/^\w+Parser:\s*/, '')
    .trim();
}
