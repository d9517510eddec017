import { stringify } from 'csv-stringify/sync';
import { Import, ImportRow } from '../../db/models';
import { NotFoundError } from '../../http/errors';

/** The column added to the rejected rows' download; the import's header detection ignores it on re-import. */
export const REASON_COLUMN = 'reason';

/**
 * The rejected rows of an import as CSV: the file's own headers and cells, unchanged and in file order,
 * plus a `reason` column (a file that came from this download reuses its own) — fix the cells and import
 * the file again. Written with the file's delimiter (comma for SDF) and a UTF-8 byte-order mark so
 * spreadsheet programs read accents and symbols right.
 */
export async function rejectedRowsCsv(id: number): Promise<{ fileName: string; body: string }> {
  const importRow = await Import.findByPk(id);
  if (!importRow) throw new NotFoundError('Import');
  const rows = await ImportRow.findAll({ where: { importId: id }, order: [['rowNumber', 'ASC']] });
  const { headers } = importRow;
  const reused = headers.includes(REASON_COLUMN) && (importRow.mapping[REASON_COLUMN] ?? 'ignore') === 'ignore';
  const outHeaders = reused ? headers : [...headers, headers.includes(REASON_COLUMN) ? `${REASON_COLUMN} (import ${id})` : REASON_COLUMN];
  const records = rows.map((row) => {
    const cells = headers.map((header) => (reused && header === REASON_COLUMN ? row.reason : row.cells[header] ?? ''));
    return reused ? cells : [...cells, row.reason];
  });
  const body = stringify([outHeaders, ...records], { delimiter: importRow.delimiter ?? ',', quoted_match: /^\s|\s$/ });
  const base = importRow.fileName.replace(/\.[^.]+$/, '');
  return { fileName: `${base}-rejected-rows.csv`, body: `\uFEFF${body}` };
}
