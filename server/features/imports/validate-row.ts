import type { z } from 'zod';
import { recordInputSchema, type RecordInput, type RecordInputParsed } from '../../../shared/schemas/record';
import type { ImportField } from '../../../shared/schemas/import';
import type { MappedRow } from './read-row';

/** Which import field a record-body path came from, to name the column in a reason. */
const fieldOfPath: Record<string, ImportField> = {
  structure: 'structure',
  name: 'name',
  technique: 'technique',
  stationaryPhase: 'phase',
  stationaryPhaseOther: 'phase',
  eluent: 'eluent',
  spots: 'rf',
  visualisation: 'stain',
  outcome: 'outcome',
  outcomeReason: 'outcomeReason',
  notebookRef: 'notebook',
  notes: 'notes',
};

const columnFieldOf: Record<string, ImportField> = {
  diameterMm: 'columnDiameter',
  cartridgeSize: 'cartridge',
  silicaG: 'silica',
  sampleMg: 'sampleMass',
  loadMethod: 'loadMethod',
  fractionMl: 'fractionSize',
  fractionsPooled: 'fractionsPooled',
  yieldPercent: 'yield',
};

function describe(issue: z.core.$ZodIssue, row: MappedRow): string {
  const [root, sub] = issue.path.map(String);
  const field = root === 'column' ? columnFieldOf[sub] : fieldOfPath[root];
  const headers = field ? row.headersFor(field) : [];
  const fromSolventColumns = root === 'eluent' && headers.length === 0 && row.solventAmounts().length > 0;
  const where = headers.length > 0 ? ` (column "${headers[0]}")` : fromSolventColumns ? ' (solvent columns)' : '';
  const message =
    issue.code === 'too_big' && 'maximum' in issue
      ? `The text is too long (at most ${String(issue.maximum)} characters).`
      : issue.message;
  return `${message}${where}`;
}

export type RowValidation = { ok: true; record: RecordInputParsed; warnings: string[] } | { ok: false; reason: string };

/** Record-body fields that make the record: a problem there rejects the row. Every other field is secondary. */
const primaryRoots = new Set(['structure', 'compoundId', 'eluent', 'spots']);

/** A secondary field's value once its problem is known: a text cut to its limit, anything else left out. */
function eased(input: RecordInput, issue: z.core.$ZodIssue): RecordInput {
  const [root, sub] = issue.path.map(String);
  const next: Record<string, unknown> = { ...input };
  const value = next[root];
  const limit = issue.code === 'too_big' && 'maximum' in issue ? Number(issue.maximum) : null;
  if (root === 'column' && sub && next.column && typeof next.column === 'object')
    next.column = { ...(next.column as object), [sub]: null };
  else if (root === 'visualisation' && Array.isArray(value) && sub !== undefined)
    next.visualisation = value.filter((_, index) => String(index) !== sub);
  else if (typeof value === 'string' && limit !== null) next[root] = value.slice(0, limit);
  else if (root === 'name') delete next.name;
  else if (root === 'stationaryPhase' || root === 'stationaryPhaseOther')
    Object.assign(next, {
      stationaryPhase: 'other',
      stationaryPhaseOther: String(input.stationaryPhase ?? 'unknown').slice(0, 120),
    });
  else next[root] = root === 'visualisation' ? [] : null;
  return next as RecordInput;
}

/**
 * Validates a row's record body with the same schema as `POST /api/records`, so an imported record is
 * held to the rules of a contributed one. A problem in the structure, eluent or spots rejects the row, every
 * problem listed with the column it came from; a problem in a secondary field (name, stains, texts too long,
 * column details) becomes a warning and that value is cut to size or left out, so a good row is never lost.
 */
export function validateRow(input: RecordInput, row: MappedRow): RowValidation {
  let current = input;
  const warnings: string[] = [];
  for (let round = 0; round < 4; round++) {
    const parsed = recordInputSchema.safeParse(current);
    if (parsed.success) return { ok: true, record: parsed.data, warnings };
    const primary = parsed.error.issues.filter((issue) => primaryRoots.has(String(issue.path[0])));
    if (primary.length > 0)
      return { ok: false, reason: [...new Set(primary.map((issue) => describe(issue, row)))].join(' ') };
    for (const issue of parsed.error.issues) {
      warnings.push(
        `${describe(issue, row)} ${issue.code === 'too_big' ? 'Cut to that length' : 'Left out'}; the row is kept.`,
      );
      current = eased(current, issue);
    }
  }
  return { ok: false, reason: 'The row could not be read as a record.' };
}
