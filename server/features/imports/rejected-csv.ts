import { stringify } from 'csv-stringify/sync';
import { Import, ImportRow } from '../../db/models';
import { NotFoundError } from '../../http/errors';

/** The column added to the rejected rows' download; the import's header detection ignores it on re-import. */
const REASON_COLUMN = 'reason';
/** The column added to the warnings download. */
const WARNING_COLUMN = 'warning';

/**
 * A text cell a spreadsheet would run as a formula (starting with =, +, -, @, tab or carriage return and not a
 * plain number) gets a leading apostrophe, as the app's export does (OWASP "CSV injection" advice).
 */
function defuseCell(cell: string): string {
  return /^[=+\-@\t\r]/.test(cell) && !/^[+-]?\d+([.,]\d+)?$/.test(cell) ? `'${cell}` : cell;
}

/**
 * The rejected rows (kind 'rejected') or the rows that came in with warnings (kind 'warning') of an import as
 * CSV: the file's own headers and cells in file order, plus a `reason` (or `warning`) column (a file that came
 * from the rejected-rows download reuses its own) — fix the cells and import the file again. Written with the
 * file's delimiter (comma for SDF and workbooks), a UTF-8 byte-order mark so spreadsheet programs read accents
 * and symbols right, and every cell that a spreadsheet would run as a formula neutralised.
 */
export async function importRowsCsv(
  id: number,
  kind: 'rejected' | 'warning',
): Promise<{ fileName: string; body: string }> {
  const importRow = await Import.findByPk(id);
  if (!importRow) throw new NotFoundError('Import');
  const rows = await ImportRow.findAll({ where: { importId: id, kind }, order: [['rowNumber', 'ASC']] });
  const { headers } = importRow;
  const column = kind === 'rejected' ? REASON_COLUMN : WARNING_COLUMN;
  const reused =
    kind === 'rejected' &&
    headers.includes(REASON_COLUMN) &&
    (importRow.mapping[REASON_COLUMN] ?? 'ignore') === 'ignore';
  const outHeaders = reused ? headers : [...headers, headers.includes(column) ? `${column} (import ${id})` : column];
  const records = rows.map((row) => {
    const cells = headers.map((header) =>
      reused && header === REASON_COLUMN ? row.reason : (row.cells[header] ?? ''),
    );
    return (reused ? cells : [...cells, row.reason]).map(defuseCell);
  });
  const delimiter = importRow.delimiter ?? ',';
  const body = stringify([outHeaders.map(defuseCell), ...records], { delimiter, quoted_match: /^\s|\s$/ });
  const base = importRow.fileName.replace(/\.[^.]+$/, '');
  return { fileName: `${base}-${kind === 'rejected' ? 'rejected-rows' : 'warnings'}.csv`, body: `\uFEFF${body}` };
}
