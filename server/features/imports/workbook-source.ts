import readXlsxFile from 'read-excel-file/node';
import { detectHeaderRow } from '../../../shared/domain/import-table';
import { UnprocessableError, UnsupportedMediaTypeError } from '../../http/errors';
import type { ImportSource } from './source';
import { tableSource, type TableRow } from './table-source';

type Cell = string | number | boolean | Date | null | undefined | object;

/**
 * A workbook cell as the text an import reads: a number as written without binary noise (0.35, not
 * 0.35000000000000003), a date cell as ISO yyyy-mm-dd (so the column's day/month order never arises), a formula's
 * cached value (read-excel-file reads the stored result), text trimmed.
 */
function cellText(cell: Cell): string {
  if (cell === null || cell === undefined) return '';
  if (cell instanceof Date) return Number.isNaN(cell.getTime()) ? '' : cell.toISOString().slice(0, 10);
  if (typeof cell === 'number') return Number.isFinite(cell) ? String(Number(cell.toPrecision(12))) : '';
  if (typeof cell === 'boolean') return cell ? 'TRUE' : 'FALSE';
  return String(cell).trim();
}

/** ZIP signature: .xlsx and .ods are ZIP archives. */
export const isZip = (bytes: Buffer) =>
  bytes.length > 4 && bytes[0] === 0x50 && bytes[1] === 0x4b && bytes[2] === 0x03 && bytes[3] === 0x04;

/**
 * Opens an .xlsx workbook (read-excel-file: typed numbers and dates, formulas' cached values, every sheet) and
 * picks the sheet whose header row looks most like a table of conditions (notes and summary sheets score
 * less), or the sheet the user chose; the header row is found as for CSV, or taken as chosen.
 */
export async function openWorkbook(
  bytes: Buffer,
  fileName: string,
  choice: { sheet?: string; headerRow?: number } = {},
): Promise<ImportSource> {
  if (/\.ods$/i.test(fileName)) {
    throw new UnsupportedMediaTypeError(
      'OpenDocument (.ods) workbooks are not read; save the sheet as .xlsx or CSV and upload that.',
    );
  }
  let sheets: { sheet: string; data: Cell[][] }[];
  try {
    sheets = (await readXlsxFile(bytes)) as unknown as { sheet: string; data: Cell[][] }[];
  } catch (error) {
    throw new UnprocessableError(
      `The workbook could not be read (${error instanceof Error ? error.message.slice(0, 200) : 'unknown error'}); ` +
        `save it again as .xlsx or CSV.`,
    );
  }
  const tables = sheets.map(({ sheet, data }) => ({
    name: sheet,
    rows: data.map((row, index): TableRow => ({ cells: row.map(cellText), line: index + 1 })),
  }));
  if (tables.length === 0) throw new UnprocessableError('The workbook holds no sheet.');
  const names = tables.map((table) => table.name);
  let chosen: (typeof tables)[number];
  if (choice.sheet !== undefined) {
    const found = tables.find((table) => table.name === choice.sheet);
    if (!found)
      throw new UnprocessableError(
        `The workbook has no sheet "${choice.sheet}" (it has ${names.map((name) => `"${name}"`).join(', ')}).`,
        { sheets: names },
      );
    chosen = found;
  } else {
    const scored = tables.map((table) => {
      const header = detectHeaderRow(table.rows.map((row) => row.cells));
      const dataRows = table.rows.slice(header.index + 1).filter((row) => row.cells.some((cell) => cell !== '')).length;
      return { table, score: header.score, dataRows };
    });
    scored.sort((a, b) => b.score - a.score || b.dataRows - a.dataRows);
    chosen = scored[0].table;
  }
  return tableSource('xlsx', chosen.rows, {
    delimiter: null,
    headerLine: choice.headerRow,
    sheet: chosen.name,
    sheets: names,
  });
}
