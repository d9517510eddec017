import { Readable } from 'node:stream';
import { parse, CsvError } from 'csv-parse';
import { UnprocessableError } from '../../http/errors';
import { headerScore } from '../../../shared/domain/import-table';
import type { ImportSource } from './source';
import { tableSource, type TableRow } from './table-source';

const delimiters = [',', ';', '\t'] as const;

/** Occurrences of a delimiter outside double-quoted text on one line. */
function countOutsideQuotes(line: string, delimiter: string): number {
  let inQuotes = false;
  let count = 0;
  for (const char of line) {
    if (char === '"') inQuotes = !inQuotes;
    else if (char === delimiter && !inQuotes) count++;
  }
  return count;
}

/**
 * Picks the delimiter (comma, semicolon or tab) that splits the header line and keeps the same number
 * of cells on the most of the following lines. Semicolon files with decimal commas ("0,35") pick ';'
 * because the header line holds no comma.
 */
export function sniffDelimiter(text: string): string {
  const lines = text
    .replace(/^\uFEFF/, '')
    .slice(0, 64_000)
    .split(/\r?\n/)
    .filter((line) => line.trim() !== '')
    .slice(0, 30);
  const [header, ...rest] = lines;
  let best: { delimiter: string; score: number; cells: number } = { delimiter: ',', score: -1, cells: 0 };
  for (const delimiter of delimiters) {
    const cells = countOutsideQuotes(header ?? '', delimiter);
    if (cells === 0) continue;
    const agreeing = rest.filter((line) => countOutsideQuotes(line, delimiter) === cells).length;
    const score = rest.length === 0 ? 1 : agreeing / rest.length;
    if (score > best.score || (score === best.score && cells > best.cells)) best = { delimiter, score, cells };
  }
  return best.delimiter;
}

interface Parsed {
  record: string[];
  info: { lines: number };
}

async function* records(text: string, delimiter: string): AsyncGenerator<{ cells: string[]; line: number }> {
  const parser = Readable.from([text]).pipe(
    parse({ delimiter, bom: true, relax_column_count: true, relax_quotes: true, skip_empty_lines: true, info: true }),
  );
  try {
    for await (const { record, info } of parser as AsyncIterable<Parsed>) {
      const innerBreaks = record.reduce((sum, cell) => sum + (cell.match(/\r\n|\r|\n/g)?.length ?? 0), 0);
      yield { cells: record, line: info.lines - innerBreaks };
    }
  } catch (error) {
    if (error instanceof CsvError) {
      const line = (error as CsvError & { lines?: number }).lines;
      throw new UnprocessableError(`The CSV could not be read${line ? ` near line ${line}` : ''}: ${error.message}`, {
        line,
      });
    }
    throw error;
  }
}

/**
 * Opens CSV text for import: sniffs the delimiter, reads every record (csv-parse: BOM, quoted fields,
 * embedded delimiters and line breaks) and finds the header row as for a workbook, so title rows above it
 * are skipped (or takes the line the user chose). A malformed file (e.g. an unclosed quote) is refused with 422.
 */
export async function openCsv(text: string, choice: { headerRow?: number } = {}): Promise<ImportSource> {
  const body = text.replace(/^\uFEFF/, '');
  const lines = body.split(/\r?\n/);
  const headerGuess = lines.findIndex((line) => headerScore(line.split(/[,;\t]/)) > 0);
  const delimiter = sniffDelimiter(lines.slice(Math.max(0, headerGuess)).join('\n'));
  const table: TableRow[] = [];
  for await (const { cells, line } of records(text, delimiter)) table.push({ cells, line });
  return tableSource('csv', table, { delimiter, headerLine: choice.headerRow });
}
