import { stringify } from 'csv-stringify/sync';
import { additiveByKey } from '../../../shared/catalogue/additives';
import { formatEluent } from '../../../shared/domain/eluent-summary';
import { techniqueLabels } from '../../../shared/schemas/record-parts';
import { phaseLabel, visualisationLabel, type ExportRecord, type LoadedRecord } from '../../core/record-presenter';

/**
 * Columns of an export, in order. Header names are ones the import's header detection reads
 * (shared/domain/import-headers.ts), so an exported file can be imported again; `record id`, `formula`
 * and `MW (g/mol)` are for reading and are ignored on import.
 */
export const exportColumns = [
  'record id',
  'compound',
  'smiles',
  'formula',
  'MW (g/mol)',
  'technique',
  'stationary phase',
  'eluent',
  'additive',
  'rf',
  'rf sm',
  'rf impurity',
  'stain',
  'outcome',
  'outcome reason',
  'notes',
  'notebook',
  'yield (%)',
  'column diameter (mm)',
  'cartridge',
  'silica (g)',
  'sample mass (mg)',
  'load',
  'fraction size (mL)',
  'fractions pooled',
  'date',
  'author',
] as const;
type ExportColumn = (typeof exportColumns)[number];

const number = (value: number | null | undefined) =>
  value === null || value === undefined ? '' : String(Math.round(value * 1e4) / 1e4);
const spotRf = (record: LoadedRecord, role: string) =>
  number(record.spots.filter((spot) => spot.role === role).sort((a, b) => a.position - b.position)[0]?.rf);

/** One record as export cells: eluent without additives (they have a column of their own), stains joined by "; ". */
function exportCells(record: LoadedRecord): Record<ExportColumn, string> {
  const { compound, eluent } = record;
  return {
    'record id': String(record.id),
    compound: compound.name ?? '',
    smiles: compound.canonicalSmiles,
    formula: compound.formula,
    'MW (g/mol)': number(compound.mw),
    technique: techniqueLabels[record.technique],
    'stationary phase': phaseLabel(record.stationaryPhase, record.stationaryPhaseOther),
    eluent: formatEluent({ ...eluent, additives: [] }),
    additive: eluent.additives
      .map((item) => `${item.percent}% ${additiveByKey(item.additive)?.label ?? item.additive}`)
      .join(' + '),
    rf: number(record.targetRf),
    'rf sm': spotRf(record, 'starting_material'),
    'rf impurity': spotRf(record, 'by_product'),
    stain: [...record.visualisations]
      .sort((a, b) => a.position - b.position)
      .map((item) => visualisationLabel(item.method, item.note))
      .join('; '),
    outcome: record.outcome,
    'outcome reason': record.outcomeReason ?? '',
    notes: record.notes ?? '',
    notebook: record.notebookRef ?? '',
    'yield (%)': number(record.yieldPercent),
    'column diameter (mm)': number(record.columnDiameterMm),
    cartridge: record.cartridgeSize ?? '',
    'silica (g)': number(record.silicaG),
    'sample mass (mg)': number(record.sampleMg),
    load: record.loadMethod ?? '',
    'fraction size (mL)': number(record.fractionMl),
    'fractions pooled': record.fractionsPooled ?? '',
    date: record.createdAt.toISOString().slice(0, 10),
    author: record.author.name,
  };
}

/**
 * A text cell a spreadsheet would run as a formula (starting with =, +, -, @, tab or carriage return and
 * not a plain number) gets a leading apostrophe (OWASP "CSV injection" advice).
 */
function defuse(cell: string): string {
  return /^[=+\-@\t\r]/.test(cell) && !/^[+-]?\d+(\.\d+)?$/.test(cell) ? `'${cell}` : cell;
}

/** Records as CSV (RFC 4180, comma, UTF-8 with a byte-order mark so spreadsheet programs read µ, ε and accents). */
export function toCsv(records: LoadedRecord[]): string {
  const rows = records.map((record) => {
    const cells = exportCells(record);
    return exportColumns.map((column) => defuse(cells[column]));
  });
  return `\uFEFF${stringify([[...exportColumns], ...rows])}`;
}

/** A data item's value on SD lines: no blank lines (they end an item), no line starting with "$$$$". */
const sdValue = (value: string) =>
  value
    .replace(/\r\n?/g, '\n')
    .split('\n')
    .filter((line) => line.trim() !== '' && !line.startsWith('$$$$'))
    .join('\n');

/**
 * Records as an SD file (MDL CTfile format): each record's compound molfile (its name on the title line)
 * followed by the export columns as data items `> <name>`, empty ones left out, then `$$$$`.
 */
export function toSdf(records: ExportRecord[]): string {
  return records
    .map((record) => {
      const cells = exportCells(record);
      const lines = record.compound.molfile.replace(/\r\n?/g, '\n').replace(/\n+$/, '').split('\n');
      lines[0] = (record.compound.name ?? '').replace(/\s+/g, ' ').slice(0, 80);
      const items = exportColumns
        .filter((column) => sdValue(cells[column]) !== '')
        .map((column) => `> <${column}>\n${sdValue(cells[column])}\n`);
      return `${lines.join('\n')}\n${items.join('\n')}\n$$$$\n`;
    })
    .join('');
}
