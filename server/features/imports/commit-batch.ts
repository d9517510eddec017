import { EventEmitter } from 'node:events';
import type { Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { Import, ImportRow } from '../../db/models';
import { findOrCreateCompounds } from '../../core/compounds';
import type { RecordContent } from '../../core/record-columns';
import { insertRecords } from '../../core/record-rows';
import { contentHashes, contentOf, type AcceptedRow, type PreparedRow } from './prepare-row';
import { storedCompoundIds, storedHashes, storedRecordCompounds } from './stored-keys';

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
  warned: number;
}

/** Inserts the fresh records grouped by author and date (the sheet's own), then their "recorded by" and raw texts. */
async function insertFresh(
  importRow: Import,
  fresh: { row: AcceptedRow; content: RecordContent }[],
  transaction: Transaction,
): Promise<void> {
  const groups = new Map<string, typeof fresh>();
  for (const item of fresh) {
    const key = `${item.row.facts.authorId ?? importRow.userId}|${item.row.facts.date ?? ''}`;
    groups.set(key, [...(groups.get(key) ?? []), item]);
  }
  const extras: { id: number; recordedBy: string | null; texts: string | null }[] = [];
  for (const [key, items] of groups) {
    const [author, date] = key.split('|');
    const records = await insertRecords(
      items.map((item) => item.content),
      {
        authorId: Number(author),
        transaction,
        importId: importRow.id,
        action: 'import',
        ...(date ? { createdAt: new Date(`${date}T12:00:00Z`) } : {}),
      },
    );
    for (const [index, record] of records.entries()) {
      const { facts } = items[index].row;
      const texts = Object.keys(facts.sourceTexts).length > 0 ? JSON.stringify(facts.sourceTexts) : null;
      if (facts.recordedBy || texts) extras.push({ id: record.id, recordedBy: facts.recordedBy, texts });
    }
  }
  if (extras.length === 0) return;
  await sequelize.query(
    `UPDATE condition_records r SET recorded_by = x.recorded_by, source_texts = CAST(x.texts AS jsonb)
       FROM jsonb_to_recordset(CAST(:rows AS jsonb)) AS x(id int, recorded_by text, texts text) WHERE r.id = x.id`,
    {
      replacements: {
        rows: JSON.stringify(extras.map((item) => ({ id: item.id, recorded_by: item.recordedBy, texts: item.texts }))),
      },
      transaction,
    },
  );
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
    const stored = await storedHashes(
      [...new Set(good.flatMap((row, index) => contentHashes(row, compounds[index].id)))],
      transaction,
    );
    const exported = await storedRecordCompounds(
      good.flatMap((row) => (row.facts.recordId ? [row.facts.recordId] : [])),
      transaction,
    );
    const fresh: { row: AcceptedRow; content: RecordContent }[] = [];
    for (const [index, row] of good.entries()) {
      const hashes = contentHashes(row, compounds[index].id);
      const sameRecord = row.facts.recordId !== null && exported.get(row.facts.recordId) === compounds[index].id;
      if (sameRecord || hashes.some((hash) => stored.has(hash))) continue;
      for (const hash of hashes) stored.add(hash);
      fresh.push({ row, content: contentOf(row, compounds[index].id) });
    }
    await insertFresh(importRow, fresh, transaction);
    const rejectedRows = rows.filter((row): row is Extract<PreparedRow, { ok: false }> => !row.ok);
    const warnedRows = fresh.filter((item) => item.row.warnings.length > 0).map((item) => item.row);
    await ImportRow.bulkCreate(
      [
        ...rejectedRows.map((row) => ({
          importId: importRow.id,
          rowNumber: row.source.row,
          line: row.source.line,
          cells: row.source.values,
          reason: row.reason,
          kind: 'rejected' as const,
        })),
        ...warnedRows.map((row) => ({
          importId: importRow.id,
          rowNumber: row.source.row,
          line: row.source.line,
          cells: row.source.values,
          reason: row.warnings.join(' '),
          kind: 'warning' as const,
        })),
      ],
      { transaction },
    );
    const counts: BatchCounts = {
      accepted: fresh.length,
      rejected: rejectedRows.length,
      duplicates: good.length - fresh.length,
      newCompounds: idcodes.filter((idcode) => !before.has(idcode)).length,
      warned: warnedRows.length,
    };
    importEvents.emit('writing', { importId: importRow.id, batch: batchNumber });
    await sequelize.query(
      `UPDATE imports SET processed = processed + :processed, accepted = accepted + :accepted, rejected = rejected + :rejected,
         duplicates = duplicates + :duplicates, warned = warned + :warned,
           new_compounds = new_compounds + :newCompounds, last_committed_row = :lastRow,
         batches_committed = batches_committed + 1, heartbeat_at = now(), updated_at = now()
       WHERE id = :id`,
      {
        replacements: {
          id: importRow.id,
          processed: rows.length,
          lastRow: rows[rows.length - 1].source.row,
          ...counts,
        },
        transaction,
      },
    );
    return counts;
  });
}
