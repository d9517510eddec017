import { splitSdf } from '../../chem/sdf';
import { UnprocessableError } from '../../http/errors';
import { uniqueHeaders, type ImportSource } from './source';

/** The column that carries each record's molfile (title line, counts line, atoms, bonds, "M  END"). */
const MOLFILE_COLUMN = 'molfile';

/**
 * Opens SD file text for import: each record becomes a row whose `molfile` column holds the molfile and
 * whose other columns are the record's data fields (`> <Rf>` …), in order of first appearance, so they
 * are mapped exactly like CSV headers.
 */
export function openSdf(text: string): ImportSource {
  const records = splitSdf(text.replace(/\r\n?/g, '\n'));
  if (records.length === 0) throw new UnprocessableError('The SD file holds no records.');
  const fieldNames: string[] = [];
  for (const record of records)
    for (const name of Object.keys(record.fields)) if (!fieldNames.includes(name)) fieldNames.push(name);
  const headers = uniqueHeaders([MOLFILE_COLUMN, ...fieldNames]);
  const headerOf = new Map(fieldNames.map((name, index) => [name, headers[index + 1]]));
  async function* rows(after = 0) {
    for (const record of records) {
      if (record.index <= after) continue;
      // fromEntries, so a data item called "__proto__" is a column like any other.
      const values: Record<string, string> = Object.fromEntries([
        [MOLFILE_COLUMN, record.molfile],
        ...fieldNames.map((name) => [headerOf.get(name) as string, record.fields[name] ?? '']),
      ]);
      yield { row: record.index, line: record.line, values, extraCells: [] };
    }
  }
  return {
    kind: 'sdf',
    delimiter: null,
    headers,
    total: records.length,
    blankRows: 0,
    rows,
    headerRow: 0,
    sheet: null,
    sheets: [],
    titleRows: [],
  };
}
