import { IGNORE_COLUMN } from '../../../shared/schemas/import';
import { detectMapping } from '../../../shared/domain/import-headers';
import { UnprocessableError, ValidationError } from '../../http/errors';
import { openCsv } from './csv-source';
import { decodeUpload, detectKind } from './file-kind';
import type { ImportFormat } from './read-row';
import { openSdf } from './sdf-source';
import { isZip, openWorkbook } from './workbook-source';
import type { ImportSource } from './source';

/** Which sheet and header row to read (by default the ones that look like the table). */
export interface TableChoice {
  sheet?: string;
  headerRow?: number;
}

/** Decodes and opens an uploaded file (.xlsx, CSV or SDF, told from its content); 415 or 422 with the reason otherwise. */
export async function openUpload(bytes: Buffer, fileName: string, choice: TableChoice = {}): Promise<ImportSource> {
  if (isZip(bytes)) return openWorkbook(bytes, fileName, choice);
  const text = decodeUpload(bytes);
  return detectKind(text, fileName) === 'sdf' ? openSdf(text) : openCsv(text, choice);
}

/**
 * The file's mapping: the user's choices for the headers they set, the automatic detection for the rest.
 * A user mapping naming a header the file does not have is refused (400).
 */
export function mappingFor(source: ImportSource, overrides: Record<string, string>): Record<string, string> {
  const unknown = Object.keys(overrides).filter((header) => !source.headers.includes(header));
  if (unknown.length > 0) {
    throw new ValidationError(
      `The mapping names column(s) the file does not have: ${unknown.map((header) => `"${header}"`).join(', ')}.`,
      { headers: source.headers },
    );
  }
  return detectMapping(source.headers, overrides);
}

/** SDF, the open dataset's shape (solvents in columns of their own, no eluent column) or plain CSV. */
export function formatOf(source: ImportSource, mapping: Record<string, string>): ImportFormat {
  if (source.kind === 'sdf') return 'sdf';
  if (source.kind === 'xlsx') return 'xlsx';
  const targets = Object.values(mapping);
  return !targets.includes('eluent') && targets.some((target) => target.startsWith('solvent:')) ? 'open-tlc' : 'csv';
}

/** Before committing: the structure, an Rf and an eluent (a column, or solvent columns) must be mapped (422 otherwise). */
export function requireEssentialColumns(mapping: Record<string, string>) {
  const targets = new Set(Object.values(mapping).filter((target) => target !== IGNORE_COLUMN));
  const missing = [
    targets.has('structure') ? null : 'the structure (SMILES or molfile)',
    targets.has('rf') ? null : 'the Rf',
    targets.has('eluent') || [...targets].some((target) => target.startsWith('solvent:'))
      ? null
      : 'the eluent (or one column per solvent)',
  ].filter(Boolean);
  if (missing.length > 0) {
    throw new UnprocessableError(`No column is mapped to ${missing.join(', ')}; adjust the mapping and try again.`, {
      mapping,
    });
  }
}
