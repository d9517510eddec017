import { EventEmitter } from 'node:events';
import { sequelize } from '../../db/sequelize';
import { Import, ImportRow } from '../../db/models';
import { findOrCreateCompounds } from '../../core/compounds';
import type { RecordContent } from '../../core/record-columns';
import { insertRecords } from '../../core/record-rows';
import { contentHashes, contentOf, type AcceptedRow, type PreparedRow } from './prepare-row';
import { storedCompoundIds, storedHashes } from './stored-keys';

/**
 * Progress of running imports in this process: `batch` after each committed batch; `writing` inside a
 * batch's transaction once its rows are written and before it commits (the fault tests stop PostgreSQL there).
 */
export const importEvents = new EventEmitter<{
  batch: [{ importId: number; batch: number; lastRow: number }];
  writing: [{ importId: number; batch: number }];
}>();

/** One lock for every import's commit, so two imports of the same rows never both add them. */
const IMPORT_LOCK = 7_346_001;

export interface BatchCounts {
  accepted: number;
  rejected: number;
  duplicates: number;
  newCompounds: number;
}

/**
 * Commits one batch in one transaction: compounds (found or created through the compounds service, with
 * fingerprints computed ahead), the records whose content hash is new (through the records service's bulk
 * insert, so they equal contributed ones), the rejected rows with their reasons, and the import's counts and
 * last committed row. If anything fails, none of it stays.
 */
export async function commitBatch(
  importRow: Import,
  rows: readonly PreparedRow[],
  fingerprints: ReadonlyMap<string, Buffer | null>,
  batchNumber: number,
): Promise<BatchCounts> {
  return sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT pg_advisory_xact_lock(:key)', { replacements: { key: IMPORT_LOCK }, transaction });
    const good = rows.filter((row): row is AcceptedRow => row.ok);
    const idcodes = [...new Set(good.map((row) => row.analysis.idcode))];
    const before = await storedCompoundIds(idcodes, transaction);
    const compounds = await findOrCreateCompounds(
      good.map((row) => ({ structure: row.record.structure, name: row.record.name ?? null, analysis: row.analysis })),
      { userId: importRow.userId, transaction, fingerprints },
    );
    const stored = await storedHashes([...new Set(good.flatMap((row, index) => contentHashes(row, compounds[index].id)))], transaction);
    const fresh: RecordContent[] = [];
    for (const [index, row] of good.entries()) {
      const hashes = contentHashes(row, compounds[index].id);
      if (hashes.some((hash) => stored.has(hash))) continue;
      for (const hash of hashes) stored.add(hash);
      fresh.push(contentOf(row, compounds[index].id));
    }
    await insertRecords(fresh, { authorId: importRow.userId, transaction, importId: importRow.id, action: 'import' });
    const rejectedRows = rows.filter((row): row is Extract<PreparedRow, { ok: false }> => !row.ok);
    await ImportRow.bulkCreate(
      rejectedRows.map((row) => ({ importId: importRow.id, rowNumber: row.source.row, line: row.source.line, cells: row.source.values, reason: row.reason })),
      { transaction },
    );
    const counts: BatchCounts = {
      accepted: fresh.length,
      rejected: rejectedRows.length,
      duplicates: good.length - fresh.length,
      newCompounds: idcodes.filter((idcode) => !before.has(idcode)).length,
    };
    importEvents.emit('writing', { importId: importRow.id, batch: batchNumber });
    await sequelize.query(
      `UPDATE imports SET processed = processed + :processed, accepted = accepted + :accepted, rejected = rejected + :rejected,
         duplicates = duplicates + :duplicates, new_compounds = new_compounds + :newCompounds, last_committed_row = :lastRow,
         batches_committed = batches_committed + 1, heartbeat_at = now(), updated_at = now()
       WHERE id = :id`,
      { replacements: { id: importRow.id, processed: rows.length, lastRow: rows[rows.length - 1].source.row, ...counts }, transaction },
    );
    return counts;
  });
}
