import type { z } from 'zod';
import { recordInputSchema, type RecordInput, type RecordInputParsed } from '../../../shared/schemas/record';
import type { ImportField } from '../../../shared/schemas/import';
import type { MappedRow } from './read-row';

/** Which import field a record-body path came from, to name the column in a reason. */
const fieldOfPath: Record<string, ImportField> = {
  structure: 'structure', name: 'name', technique: 'technique', stationaryPhase: 'phase', stationaryPhaseOther: 'phase',
  eluent: 'eluent', spots: 'rf', visualisation: 'stain', outcome: 'outcome', outcomeReason: 'outcomeReason',
  notebookRef: 'notebook', notes: 'notes',
};

const columnFieldOf: Record<string, ImportField> = {
  diameterMm: 'columnDiameter', cartridgeSize: 'cartridge', silicaG: 'silica', sampleMg: 'sampleMass', loadMethod: 'loadMethod',
  fractionMl: 'fractionSize', fractionsPooled: 'fractionsPooled', yieldPercent: 'yield',
};

function describe(issue: z.core.$ZodIssue, row: MappedRow): string {
  const [root, sub] = issue.path.map(String);
  const field = root === 'column' ? columnFieldOf[sub] : fieldOfPath[root];
  const headers = field ? row.headersFor(field) : [];
  const fromSolventColumns = root === 'eluent' && headers.length === 0 && row.solventAmounts().length > 0;
  const where = headers.length > 0 ? ` (column "${headers[0]}")` : fromSolventColumns ? ' (solvent columns)' : '';
  const message = issue.code === 'too_big' && 'maximum' in issue ? `The text is too long (at most ${String(issue.maximum)} characters).` : issue.message;
  return `${message}${where}`;
}

export type RowValidation = { ok: true; record: RecordInputParsed } | { ok: false; reason: string };

/**
 * Validates a row's record body with the same schema as `POST /api/records`, so an imported record is
 * held to the rules of a contributed one (eluent notation and names, phase and stain names, Rf range).
 * Every problem is listed in the reason with the column it came from.
 */
export function validateRow(input: RecordInput, row: MappedRow): RowValidation {
  const parsed = recordInputSchema.safeParse(input);
  if (parsed.success) return { ok: true, record: parsed.data };
  const reasons = [...new Set(parsed.error.issues.map((issue) => describe(issue, row)))];
  return { ok: false, reason: reasons.join(' ') };
}
