import { stationaryPhaseByKey } from '../../../shared/catalogue/stationary-phases';
import { formatEluent } from '../../../shared/domain/eluent-notation';
import type { ImportPreview, ImportRowResult } from '../../../shared/schemas/import';
import { formatOf, mappingFor, openUpload } from './open-upload';
import { contentHashes, prepareRow, StructureCache, type PreparedRow } from './prepare-row';
import { storedCompoundIds, storedHashes, storedRecordCompounds } from './stored-keys';
import { dateColumnOrder, rowContext } from './import-context';
import type { ImportChoice } from '../../../shared/schemas/import';

/** The result a committed import would give each prepared row, reading the database and writing nothing. */
async function resultsOf(rows: PreparedRow[]): Promise<ImportRowResult[]> {
  const good = rows.flatMap((row) => (row.ok ? [row] : []));
  const compoundIds = await storedCompoundIds([...new Set(good.map((row) => row.analysis.idcode))]);
  const exported = await storedRecordCompounds(good.flatMap((row) => (row.facts.recordId ? [row.facts.recordId] : [])));
  const provisional = new Map<string, number>();
  const hashesOf = new Map<PreparedRow, string[]>();
  for (const row of good) {
    const { idcode } = row.analysis;
    const compoundId = compoundIds.get(idcode) ?? provisional.get(idcode) ?? -(provisional.size + 1);
    if (!compoundIds.has(idcode)) provisional.set(idcode, compoundId);
    hashesOf.set(row, contentHashes(row, compoundId));
  }
  const seen = await storedHashes([...new Set([...hashesOf.values()].flat())]);
  return rows.map((row) => {
    const base = {
      row: row.source.row,
      line: row.source.line,
      notes: row.notes,
      warnings: row.ok ? row.warnings : [],
      values: row.source.values,
    };
    if (!row.ok) return { ...base, result: 'rejected', reason: row.reason, record: null };
    const hashes = hashesOf.get(row) as string[];
    const recordId = row.facts.recordId;
    const sameRecord =
      recordId !== null &&
      exported.get(recordId) !== undefined &&
      exported.get(recordId) === compoundIds.get(row.analysis.idcode);
    const duplicate = sameRecord || hashes.some((hash) => seen.has(hash));
    for (const hash of hashes) seen.add(hash);
    return {
      ...base,
      result: duplicate ? 'duplicate' : 'accepted',
      reason: sameRecord
        ? `This is record ${recordId}, already stored (the file is an export of this app).`
        : duplicate
          ? 'The same record is already stored (or appears earlier in the file).'
          : null,
      record: {
        name: row.record.name ?? row.analysis.name,
        smiles: row.analysis.canonicalSmiles,
        eluent: formatEluent(row.record.eluent),
        rf: row.record.spots.find((spot) => spot.role === 'target')?.rf ?? null,
        phase: stationaryPhaseByKey(row.record.stationaryPhase)?.name ?? row.record.stationaryPhase,
      },
    };
  });
}

/** Rows a dry run reads in full to count what an import would bring in (a group's sheet is rarely longer). */
const PREVIEW_CHECK_ROWS = 1_000;

/**
 * A dry run: opens the file (the sheet and header row found or chosen), maps its headers (the user's choices
 * win), decides the date column's day/month order, and gives each row's result exactly as an import would
 * decide it: the first `previewRows` shown, counts over up to PREVIEW_CHECK_ROWS rows. Nothing is written.
 */
export async function previewUpload(
  file: { bytes: Buffer; name: string; sha256: string },
  overrides: Record<string, string>,
  previewRows: number,
  choice: ImportChoice = {},
): Promise<ImportPreview> {
  const source = await openUpload(file.bytes, file.name, choice);
  const mapping = mappingFor(source, overrides);
  const format = formatOf(source, mapping);
  const dates = await dateColumnOrder(source, mapping, choice.dateOrder);
  const context = await rowContext(dates.order);
  const structures = new StructureCache();
  const prepared: PreparedRow[] = [];
  for await (const row of source.rows()) {
    prepared.push(prepareRow(row, mapping, format, structures, context));
    if (prepared.length >= Math.max(previewRows, PREVIEW_CHECK_ROWS)) break;
    if (prepared.length % 50 === 0) await new Promise((resolve) => setImmediate(resolve));
  }
  const results = await resultsOf(prepared);
  const count = (result: ImportRowResult['result']) => results.filter((row) => row.result === result).length;
  return {
    dryRun: true,
    fileName: file.name,
    sha256: file.sha256,
    format,
    delimiter: source.delimiter,
    headers: source.headers,
    mapping,
    total: source.total,
    blankRows: source.blankRows,
    rows: results.slice(0, previewRows),
    checked: results.length,
    accepted: count('accepted'),
    rejected: count('rejected'),
    duplicates: count('duplicate'),
    warned: results.filter((row) => row.result === 'accepted' && row.warnings.length > 0).length,
    sheet: source.sheet,
    sheets: source.sheets,
    headerRow: source.headerRow,
    titleRows: source.titleRows,
    dates: { column: dates.column, order: dates.order, needsChoice: dates.needsChoice, evidence: dates.evidence },
  };
}
