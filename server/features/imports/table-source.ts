import { detectHeaderRow } from '../../../shared/domain/import-table';
import { UnprocessableError } from '../../http/errors';
import { uniqueHeaders, type ImportSource, type SourceRow } from './source';

/** A table row as read from a file: its cells as text and the line (CSV) or sheet row (workbook) it sits on. */
export interface TableRow {
  cells: string[];
  line: number;
}

const isBlank = (cells: readonly string[]) => cells.every((cell) => cell.trim() === '');

/**
 * A table (CSV records or one sheet's rows) as an import source: the header row is the one given (its line
 * or sheet row number) or the one that looks most like a header among the first rows, so title rows, notes
 * and a merged group header above it are skipped. Blank rows are counted, not imported.
 */
export function tableSource(
  kind: 'csv' | 'xlsx',
  table: readonly TableRow[],
  options: { delimiter: string | null; headerLine?: number; sheet?: string | null; sheets?: string[] },
): ImportSource {
  if (table.length === 0 || table.every((row) => isBlank(row.cells)))
    throw new UnprocessableError('The file holds no header row.');
  let index: number;
  if (options.headerLine !== undefined) {
    index = table.findIndex((row) => row.line === options.headerLine);
    if (index < 0 || isBlank(table[index].cells)) {
      throw new UnprocessableError(
        `Row ${options.headerLine} is empty or beyond the table; choose another header row.`,
        { headerRow: options.headerLine },
      );
    }
  } else index = detectHeaderRow(table.map((row) => row.cells)).index;
  const headerCells = [...table[index].cells];
  while (headerCells.length > 0 && headerCells[headerCells.length - 1].trim() === '') headerCells.pop();
  const headers = uniqueHeaders(headerCells);
  const body = table.slice(index + 1);
  const blankRows = body.filter((row) => isBlank(row.cells)).length;
  const data = body.filter((row) => !isBlank(row.cells));
  async function* rows(after = 0): AsyncGenerator<SourceRow> {
    for (let i = after; i < data.length; i++) {
      const { cells, line } = data[i];
      const values = Object.fromEntries(headers.map((header, column) => [header, cells[column] ?? '']));
      yield { row: i + 1, line, values, extraCells: cells.slice(headers.length).filter((cell) => cell.trim() !== '') };
    }
  }
  return {
    kind,
    delimiter: options.delimiter,
    headers,
    total: data.length,
    blankRows,
    rows,
    headerRow: table[index].line,
    sheet: options.sheet ?? null,
    sheets: options.sheets ?? [],
    titleRows: table
      .slice(0, index)
      .filter((row) => !isBlank(row.cells))
      .map((row) =>
        row.cells
          .filter((cell) => cell.trim())
          .join(' · ')
          .slice(0, 200),
      )
      .slice(0, 10),
  };
}
