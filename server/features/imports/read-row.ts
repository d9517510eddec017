import { IGNORE_COLUMN, type ImportField } from '../../../shared/schemas/import';
import type { RecordInput, SpotInput } from '../../../shared/schemas/record';
import { readLoad, readNumber, readOutcome, readTechnique, splitVisualisations } from './cells';
import { eluentFromAmounts, type SolventAmount } from './solvent-columns';
import type { SourceRow } from './source';

export type ImportFormat = 'csv' | 'sdf' | 'open-tlc';

/** A row turned into a record body (still to be validated like a contributed record), with what was assumed. */
/**
 * `plainNotes` is the notes text without the date and author lines the import adds (undefined when it added
 * none): a row that matches a stored record apart from those lines — as a re-imported export does — is a duplicate.
 */
export type RowReading = { ok: true; input: RecordInput; notes: string[]; plainNotes?: string | null } | { ok: false; reason: string };

/** Rf the open TLC dataset reports at or below 0 (spot on the origin) is stored as this smallest readable Rf. */
export const OPEN_TLC_MIN_RF = 0.001;

class RowProblem extends Error {}

/** Reads a mapped row's cells by field. */
export class MappedRow {
  constructor(readonly source: SourceRow, private readonly mapping: Record<string, string>) {}

  headersFor(target: string): string[] {
    return Object.keys(this.mapping).filter((header) => this.mapping[header] === target);
  }

  /** The trimmed cell of the column mapped to a field ('' when none). */
  cell(field: ImportField): string {
    return this.headersFor(field).map((header) => (this.source.values[header] ?? '').trim()).filter(Boolean).join('\n');
  }

  /**
   * The structure text: a SMILES trimmed, a molfile kept as written (its first line is the title, often
   * blank, and trimming it would shift the counts line).
   */
  structure(): string {
    const raw = this.headersFor('structure').map((header) => this.source.values[header] ?? '').find((value) => value.trim() !== '') ?? '';
    return /\n/.test(raw.trim()) ? raw.replace(/\s+$/, '\n') : raw.trim();
  }

  header(field: ImportField): string {
    return this.headersFor(field)[0] ?? field;
  }

  solventAmounts(): SolventAmount[] {
    return Object.entries(this.mapping)
      .filter(([, target]) => target.startsWith('solvent:') && target !== IGNORE_COLUMN)
      .map(([header, target]) => ({ solvent: target.slice('solvent:'.length), header, cell: this.source.values[header] ?? '' }));
  }
}

function must<T>(result: { ok: true; value: T } | { ok: false; message: string }): T {
  if (!result.ok) throw new RowProblem(result.message);
  return result.value;
}

function readRf(row: MappedRow, field: 'rf' | 'rfStartingMaterial' | 'rfOther', format: ImportFormat, notes: string[]): number | null {
  const label = `Rf (column "${row.header(field)}")`;
  const rf = must(readNumber(row.cell(field), label, { prefix: /^rf\s*[=:]?/i }));
  if (rf === null || (rf > 0 && rf <= 1)) return rf;
  if (format === 'open-tlc' && rf > -0.05 && rf < 1.05) {
    const clamped = rf > 1 ? 1 : OPEN_TLC_MIN_RF;
    notes.push(`Rf ${rf} clamped to ${clamped}: the open dataset's image analysis reads a few spots just outside 0–1.`);
    return clamped;
  }
  throw new RowProblem(`${label} ${rf} is outside (0, 1].`);
}

function readEluent(row: MappedRow, notes: string[]): RecordInput['eluent'] {
  const written = row.cell('eluent');
  const additive = row.cell('additive');
  const withAdditive = (text: string) => (additive ? `${text} ${/^\+/.test(additive) ? '' : '+ '}${additive}` : text);
  if (written) return withAdditive(written);
  const fromColumns = eluentFromAmounts(row.solventAmounts());
  if (!fromColumns.ok) throw new RowProblem(fromColumns.message);
  if (fromColumns.components === null) {
    const where = row.headersFor('eluent')[0] ? `the "${row.headersFor('eluent')[0]}" column is empty` : 'no column holds the eluent';
    throw new RowProblem(`Missing eluent: ${where}.`);
  }
  notes.push(fromColumns.note);
  if (!additive) return { components: fromColumns.components, additives: [] };
  return withAdditive(fromColumns.components.map((part) => part.solvent).join('/') + ' ' + fromColumns.components.map((part) => part.parts).join(':'));
}

function readSpots(row: MappedRow, format: ImportFormat, notes: string[]): SpotInput[] {
  const target = readRf(row, 'rf', format, notes);
  if (target === null) throw new RowProblem(row.headersFor('rf')[0] ? `Missing Rf: the "${row.header('rf')}" column is empty.` : 'Missing Rf: no column holds the Rf.');
  const spots: SpotInput[] = [{ role: 'target', rf: target }];
  const startingMaterial = readRf(row, 'rfStartingMaterial', format, notes);
  if (startingMaterial !== null) spots.push({ role: 'starting_material', rf: startingMaterial, lane: 'starting_material' });
  const byProduct = readRf(row, 'rfOther', format, notes);
  if (byProduct !== null) spots.push({ role: 'by_product', rf: byProduct });
  return spots;
}

function readColumn(row: MappedRow): RecordInput['column'] {
  const number = (field: ImportField, label: string, percent = false) => must(readNumber(row.cell(field), `${label} (column "${row.header(field)}")`, { percent }));
  const yieldPercent = number('yield', 'Yield', true);
  if (yieldPercent !== null && (yieldPercent < 0 || yieldPercent > 100)) throw new RowProblem(`Yield ${yieldPercent}% (column "${row.header('yield')}") is outside 0–100 %.`);
  const column = {
    diameterMm: number('columnDiameter', 'Column diameter'),
    cartridgeSize: row.cell('cartridge') || null,
    silicaG: number('silica', 'Silica mass'),
    sampleMg: number('sampleMass', 'Sample mass'),
    loadMethod: must(readLoad(row.cell('loadMethod'))),
    fractionMl: number('fractionSize', 'Fraction size'),
    fractionsPooled: row.cell('fractionsPooled') || null,
    yieldPercent,
  };
  return Object.values(column).some((value) => value !== null) ? column : null;
}

function readNotes(row: MappedRow): { notes: string | null; plainNotes?: string | null } {
  const plain = row.cell('notes') || null;
  const provenance = [
    row.cell('date') ? `Date (from the import): ${row.cell('date')}` : '',
    row.cell('author') ? `Original author (from the import): ${row.cell('author')}` : '',
  ].filter(Boolean);
  if (provenance.length === 0) return { notes: plain };
  return { notes: [plain, ...provenance].filter(Boolean).join('\n'), plainNotes: plain };
}

/**
 * Turns one mapped row into a record body as a contributor would send it, plus notes on every default
 * taken (phase, technique, outcome) and every value adjusted. Problems a chemist must fix (missing Rf or
 * eluent, a word that is not a number, a cell beyond the header) reject the row with a reason.
 */
export function readRow(source: SourceRow, mapping: Record<string, string>, format: ImportFormat): RowReading {
  const row = new MappedRow(source, mapping);
  const notes: string[] = [];
  try {
    if (source.extraCells.length > 0) throw new RowProblem(`The row has ${source.extraCells.length} cell(s) beyond the last header: "${source.extraCells.join('", "').slice(0, 120)}".`);
    const structure = row.structure();
    if (!structure) throw new RowProblem(row.headersFor('structure')[0] ? `Missing structure: the "${row.header('structure')}" column is empty.` : 'Missing structure: no column holds a SMILES or molfile.');
    const spots = readSpots(row, format, notes);
    const eluent = readEluent(row, notes);
    const column = readColumn(row);
    let technique = must(readTechnique(row.cell('technique')));
    if (!technique) {
      technique = column ? 'flash' : 'tlc';
      notes.push(`No technique given: recorded as ${technique === 'flash' ? 'a flash column (column details present)' : 'TLC'}.`);
    }
    let outcome = must(readOutcome(row.cell('outcome')));
    if (!outcome) {
      outcome = 'clean';
      notes.push('No outcome given: recorded as clean.');
    }
    const phase = row.cell('phase');
    const notesText = readNotes(row);
    if (!phase) notes.push('No stationary phase given: silica gel assumed.');
    const input: RecordInput = {
      structure,
      ...(row.cell('name') ? { name: row.cell('name') } : {}),
      technique,
      stationaryPhase: phase || 'silica',
      eluent,
      spots,
      visualisation: splitVisualisations(row.cell('stain')),
      outcome,
      outcomeReason: row.cell('outcomeReason') || null,
      column,
      notebookRef: row.cell('notebook') || null,
      notes: notesText.notes,
    };
    return { ok: true, input, notes, ...('plainNotes' in notesText ? { plainNotes: notesText.plainNotes } : {}) };
  } catch (error) {
    if (error instanceof RowProblem) return { ok: false, reason: error.message };
    throw error;
  }
}
