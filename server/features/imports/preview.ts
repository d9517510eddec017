import { stationaryPhaseByKey } from '../../../shared/catalogue/stationary-phases';
import { formatEluent } from '../../../shared/domain/eluent-notation';
import type { ImportPreview, ImportRowResult } from '../../../shared/schemas/import';
import { formatOf, mappingFor, openUpload } from './open-upload';
import { contentHashes, prepareRow, StructureCache, type PreparedRow } from './prepare-row';
import { storedCompoundIds, storedHashes } from './stored-keys';

/** The result a committed import would give each prepared row, reading the database and writing nothing. */
async function resultsOf(rows: PreparedRow[]): Promise<ImportRowResult[]> {
  const good = rows.flatMap((row) => (row.ok ? [row] : []));
  const compoundIds = await storedCompoundIds([...new Set(good.map((row) => row.analysis.idcode))]);
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
    const base = { row: row.source.row, line: row.source.line, notes: row.notes, values: row.source.values };
    if (!row.ok) return { ...base, result: 'rejected', reason: row.reason, record: null };
    const hashes = hashesOf.get(row) as string[];
    const duplicate = hashes.some((hash) => seen.has(hash));
    for (const hash of hashes) seen.add(hash);
    return {
      ...base,
      result: duplicate ? 'duplicate' : 'accepted',
      reason: duplicate ? 'The same record is already stored (or appears earlier in the file).' : null,
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

/**
 * A dry run: opens the file, maps its headers (the user's choices win), and gives the first rows' results
 * exactly as an import would decide them. Nothing is written.
 */
export async function previewUpload(file: { bytes: Buffer; name: string; sha256: string }, overrides: Record<string, string>, previewRows: number): Promise<ImportPreview> {
  const source = await openUpload(file.bytes, file.name);
  const mapping = mappingFor(source, overrides);
  const format = formatOf(source, mapping);
  const structures = new StructureCache();
  const prepared: PreparedRow[] = [];
  for await (const row of source.rows()) {
    prepared.push(prepareRow(row, mapping, format, structures));
    if (prepared.length >= previewRows) break;
  }
  const rows = await resultsOf(prepared);
  const count = (result: ImportRowResult['result']) => rows.filter((row) => row.result === result).length;
  return {
    dryRun: true, fileName: file.name, sha256: file.sha256, format, delimiter: source.delimiter, headers: source.headers, mapping,
    total: source.total, blankRows: source.blankRows, rows, accepted: count('accepted'), rejected: count('rejected'), duplicates: count('duplicate'),
  };
}
