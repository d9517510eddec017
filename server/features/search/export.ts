import type { ExportQueryParsed } from '../../../shared/schemas/search';
import type { ExportRecord } from '../../core/record-presenter';
import { loadListRecords } from '../../core/record-queries';
import { rankedMatches } from './service';

/** Most records one export holds; the answer says when the search matched more (header X-Export-Truncated). */
export const EXPORT_LIMIT = 10_000;
const CHUNK = 500;

/** The records of a search (same filters and order as the search page), loaded in chunks for the export writers. */
export async function recordsToExport(query: ExportQueryParsed): Promise<{ records: ExportRecord[]; total: number }> {
  const { rows } = await rankedMatches(query);
  const ids = rows.slice(0, EXPORT_LIMIT).map((row) => row.id);
  const records: ExportRecord[] = [];
  for (let start = 0; start < ids.length; start += CHUNK)
    records.push(...(await loadListRecords(ids.slice(start, start + CHUNK), { withMolfile: true })).records);
  return { records, total: rows.length };
}
