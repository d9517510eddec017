import { IGNORE_COLUMN, type ImportField } from '../../../shared/schemas/import';
import type { RecordInput, SpotInput } from '../../../shared/schemas/record';
import { readLoad, readNumber, readOutcome, readTechnique } from './cells';
import { eluentFromAmounts, type SolventAmount } from './solvent-columns';
import type { SourceRow } from './source';
import { readPhase, readVisualisation, readWhoAndWhen, type RowContext, type RowFacts } from './row-facts';

export type ImportFormat = 'csv' | 'sdf' | 'open-tlc' | 'xlsx';

/**
 * A row turned into a record body (still to be validated like a contributed record), with what was assumed
 * (`notes`), what was only partly read (`warnings`, each naming its column) and the row's own facts.
 */
export type RowReading =
  | { ok: true; input: RecordInput; notes: string[]; warnings: string[]; facts: RowFacts }
  | { ok: false; reason: string };

/** Rf the open TLC dataset reports at or below 0 (spot on the origin) is stored as this smallest readable Rf. */
const OPEN_TLC_MIN_RF = 0.001;

class RowProblem extends Error {}

/** Reads a mapped row's cells by field. */
export class MappedRow {
  constructor(
    readonly source: SourceRow,
    private readonly mapping: Record<string, string>,
  ) {}

  headersFor(target: string): string[] {
    return Object.keys(this.mapping).filter((header) => this.mapping[header] === target);
  }

  /** The trimmed cell of the column mapped to a field ('' when none). */
  cell(field: ImportField): string {
    return this.headersFor(field)
      .map((header) => (this.source.values[header] ?? '').trim())
      .filter(Boolean)
      .join('\n');
  }

  /**
   * The structure text: a SMILES trimmed, a molfile kept as written (its first line is the title, often
   * blank, and trimming it would shift the counts line).
   */
  structure(): string {
    const raw =
      this.headersFor('structure')
        .map((header) => this.source.values[header] ?? '')
        .find((value) => value.trim() !== '') ?? '';
    return /\n/.test(raw.trim()) ? raw.replace(/\s+$/, '\n') : raw.trim();
  }

  header(field: ImportField): string {
    return this.headersFor(field)[0] ?? field;
  }

  solventAmounts(): SolventAmount[] {
    return Object.entries(this.mapping)
      .filter(([, target]) => target.startsWith('solvent:') && target !== IGNORE_COLUMN)
      .map(([header, target]) => ({
        solvent: target.slice('solvent:'.length),
        header,
        cell: this.source.values[header] ?? '',
      }));
  }
}

function must<T>(result: { ok: true; value: T } | { ok: false; message: string }): T {
  if (!result.ok) throw new RowProblem(result.message);
  return result.value;
}

function readRf(
  row: MappedRow,
  field: 'rf' | 'rfStartingMaterial' | 'rfOther',
  format: ImportFormat,
  notes: string[],
): number | null {
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
    const where = row.headersFor('eluent')[0]
      ? `the "${row.headersFor('eluent')[0]}" column is empty`
      : 'no column holds the eluent';
    throw new RowProblem(`Missing eluent: ${where}.`);
  }
  notes.push(fromColumns.note);
  if (!additive) return { components: fromColumns.components, additives: [] };
  return withAdditive(
    fromColumns.components.map((part) => part.solvent).join('/') +
      ' ' +
      fromColumns.components.map((part) => part.parts).join(':'),
  );
}

/** A secondary value: its problem becomes a warning and the value is left out. */
function softly<T>(read: () => T, warnings: string[], fallback: T, column?: string): T {
  try {
    return read();
  } catch (error) {
    if (!(error instanceof RowProblem)) throw error;
    const where = column && !error.message.includes('(column "') ? ` (column "${column}")` : '';
    warnings.push(`${error.message.replace(/\.$/, '')}${where}. Left out; the row is kept.`);
    return fallback;
  }
}

function readSpots(row: MappedRow, format: ImportFormat, notes: string[], warnings: string[]): SpotInput[] {
  const target = readRf(row, 'rf', format, notes);
  if (target === null)
    throw new RowProblem(
      row.headersFor('rf')[0]
        ? `Missing Rf: the "${row.header('rf')}" column is empty.`
        : 'Missing Rf: no column holds the Rf.',
    );
  const spots: SpotInput[] = [{ role: 'target', rf: target }];
  const startingMaterial = softly(() => readRf(row, 'rfStartingMaterial', format, notes), warnings, null);
  if (startingMaterial !== null)
    spots.push({ role: 'starting_material', rf: startingMaterial, lane: 'starting_material' });
  const byProduct = softly(() => readRf(row, 'rfOther', format, notes), warnings, null);
  if (byProduct !== null) spots.push({ role: 'by_product', rf: byProduct });
  return spots;
}

function readColumn(row: MappedRow, warnings: string[]): RecordInput['column'] {
  const number = (field: ImportField, label: string, percent = false) => {
    const value = softly(
      () => must(readNumber(row.cell(field), `${label} (column "${row.header(field)}")`, { percent })),
      warnings,
      null,
    );
    if (value !== null && value <= 0 && !percent) {
      warnings.push(`${label} (column "${row.header(field)}") ${value} is not positive. Left out; the row is kept.`);
      return null;
    }
    return value;
  };
  let yieldPercent = number('yield', 'Yield', true);
  if (yieldPercent !== null && (yieldPercent < 0 || yieldPercent > 100)) {
    warnings.push(
      `Yield ${yieldPercent}% (column "${row.header('yield')}") is outside 0–100 %. Left out; the row is kept.`,
    );
    yieldPercent = null;
  }
  const column = {
    diameterMm: number('columnDiameter', 'Column diameter'),
    cartridgeSize: row.cell('cartridge').slice(0, 40) || null,
    silicaG: number('silica', 'Silica mass'),
    sampleMg: number('sampleMass', 'Sample mass'),
    loadMethod: softly(() => must(readLoad(row.cell('loadMethod'))), warnings, null, row.header('loadMethod')),
    fractionMl: number('fractionSize', 'Fraction size'),
    fractionsPooled: row.cell('fractionsPooled').slice(0, 60) || null,
    yieldPercent,
  };
  return Object.values(column).some((value) => value !== null) ? column : null;
}

/**
 * Turns one mapped row into a record body as a contributor would send it, plus notes on every default
 * taken and warnings on every secondary text only partly read (plate, stain, date, numbers of the column, words
 * for technique, outcome or load): those never reject a row. Only what makes a record meaningless or wrong
 * rejects it: no structure, no Rf or one outside (0, 1], no eluent (an unknown solvent is found at validation).
 */
export function readRow(
  source: SourceRow,
  mapping: Record<string, string>,
  format: ImportFormat,
  context: RowContext = { dateOrder: null, members: [] },
): RowReading {
  const row = new MappedRow(source, mapping);
  const notes: string[] = [];
  const warnings: string[] = [];
  const facts: RowFacts = { date: null, authorId: null, recordedBy: null, sourceTexts: {}, recordId: null };
  try {
    const structure = row.structure();
    if (!structure)
      throw new RowProblem(
        row.headersFor('structure')[0]
          ? `Missing structure: the "${row.header('structure')}" column is empty.`
          : 'Missing structure: no column holds a SMILES or molfile.',
      );
    const spots = readSpots(row, format, notes, warnings);
    const eluent = readEluent(row, notes);
    if (source.extraCells.length > 0) {
      warnings.push(
        `The row has ${source.extraCells.length} cell(s) beyond the last header, not imported: ` +
          `"${source.extraCells.join('", "').slice(0, 120)}".`,
      );
    }
    const column = readColumn(row, warnings);
    let technique = softly(() => must(readTechnique(row.cell('technique'))), warnings, null, row.header('technique'));
    if (!technique && row.cell('technique')) facts.sourceTexts.technique = row.cell('technique');
    if (!technique) {
      technique = column ? 'flash' : 'tlc';
      notes.push(
        `No technique read: recorded as ${technique === 'flash' ? 'a flash column (column details present)' : 'TLC'}.`,
      );
    }
    let outcome = softly(() => must(readOutcome(row.cell('outcome'))), warnings, null, row.header('outcome'));
    if (!outcome) {
      outcome = 'clean';
      if (row.cell('outcome')) facts.sourceTexts.outcome = row.cell('outcome');
      notes.push('No outcome read: recorded as clean.');
    }
    const phase = readPhase(row, technique, warnings, notes, facts);
    const visualisation = readVisualisation(row, warnings, facts);
    readWhoAndWhen(row, context, warnings, facts);
    const input: RecordInput = {
      structure,
      ...(row.cell('name') ? { name: row.cell('name') } : {}),
      technique,
      ...phase,
      eluent,
      spots,
      visualisation,
      outcome,
      outcomeReason: row.cell('outcomeReason') || null,
      column,
      notebookRef: row.cell('notebook') || null,
      notes: row.cell('notes') || null,
    };
    return { ok: true, input, notes, warnings, facts };
  } catch (error) {
    if (error instanceof RowProblem) return { ok: false, reason: error.message };
    throw error;
  }
}
