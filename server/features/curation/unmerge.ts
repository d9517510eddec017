import { Op, QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { AuditEntry, RecordMerge } from '../../db/models';
import { ConflictError, NotFoundError } from '../../http/errors';
import type { UnmergeResult } from '../../../shared/schemas/curation';
import type { MergeEffects } from '../../db/models/record-merge';
import { presentCurationRecord } from './presenters';
import { diffStates, loadRecordState, type RecordState } from '../../core/record-revisions';
import { appendCurationRevision, lockRecords } from './revisions';
import { childTables, hasBookmarks, recordDigests, reinsertRow, restoreRow } from './snapshot';
import { curationRowsByIds } from './records';

export interface UnmergeBlock {
  message: string;
  details: Record<string, unknown>;
}

/**
 * Why a merge cannot be undone now, or null when it can. Refused: a merge already undone; a survivor merged
 * again since (undo that later merge first); any involved record whose rows changed after the merge (an
 * edit, a retirement, a photo or spot added or removed) — restoring the snapshot would silently undo that work.
 */
export async function unmergeBlock(merge: RecordMerge, transaction?: Transaction): Promise<UnmergeBlock | null> {
  if (merge.undoneAt)
    return {
      message: `Merge ${merge.id} was already undone on ${merge.undoneAt.toISOString().slice(0, 10)}; a merge can be undone once.`,
      details: { undoneAt: merge.undoneAt },
    };
  const [survivor] = await sequelize.query<{ status: string; mergedIntoId: number | null }>(
    'SELECT status, merged_into_id AS "mergedIntoId" FROM condition_records WHERE id = :id',
    { replacements: { id: merge.survivorId }, type: QueryTypes.SELECT, transaction },
  );
  if (survivor.status === 'merged') {
    const later = await RecordMerge.findOne({
      where: { mergedIds: { [Op.contains]: [merge.survivorId] }, undoneAt: null },
      order: [['id', 'DESC']],
      transaction,
    });
    return {
      message:
        `Record ${merge.survivorId} was merged into record ${survivor.mergedIntoId} ` +
        `since${later ? ` (merge ${later.id})` : ''}; undo that merge first.`,
      details: { laterMergeId: later?.id ?? null, mergedIntoId: survivor.mergedIntoId },
    };
  }
  const ids = [merge.survivorId, ...merge.mergedIds];
  const now = await recordDigests(ids, transaction);
  const changed = ids.filter((id) => now[String(id)] !== merge.afterDigests[String(id)]);
  if (changed.length === 0) return null;
  return {
    message:
      `Record ${changed.join(', ')} changed after this merge (edited, retired, or a spot or ` +
      `photo changed); unmerging would undo that later work, so it is refused. Revert those changes first.`,
    details: { changedRecordIds: changed },
  };
}

async function restoreBookmarks(merge: RecordMerge, effects: MergeEffects, transaction: Transaction) {
  const rows = merge.before.bookmarks;
  if (!rows || !(await hasBookmarks(transaction))) return;
  const unitedInto = effects.bookmarkUnitedInto ?? {};
  const [{ present }] = await sequelize.query<{ present: number[] }>(
    "SELECT coalesce(array_agg(id), '{}') AS present FROM bookmarks WHERE id IN (:ids)",
    {
      replacements: { ids: [0, ...Object.values(unitedInto)] },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  for (const row of rows) {
    const keptId = unitedInto[String(row.id)];
    if (keptId === undefined) {
      await sequelize.query('UPDATE bookmarks SET record_id = :recordId WHERE id = :id', {
        replacements: { recordId: row.record_id, id: row.id },
        transaction,
      });
    } else if (present.includes(keptId)) {
      await reinsertRow('bookmarks', row, transaction);
    }
  }
  for (const [id, noteAfter] of Object.entries(effects.bookmarkNotesAfter ?? {})) {
    const original = rows.find((row) => String(row.id) === id);
    if (!original) continue;
    await sequelize.query('UPDATE bookmarks SET note = :note WHERE id = :id AND note IS NOT DISTINCT FROM :noteAfter', {
      replacements: { id: Number(id), note: original.note ?? null, noteAfter },
      transaction,
    });
  }
}

/**
 * Undoes a merge from its before-snapshot: every record's row (status active, fields, notes; not the
 * revision counter, which moves on), spots, visualisations, photos and contributors as they were; credits
 * the merge added removed; bookmarks moved back and de-duplicated ones re-inserted — unless their user deleted
 * the united bookmark after the merge, which stays their choice. History keeps the merge and gains an 'unmerge' revision on each record.
 */
export async function unmergeRecords(mergeId: number, actorId: number): Promise<UnmergeResult> {
  const ids = await sequelize.transaction(async (transaction) => {
    const merge = await RecordMerge.findByPk(mergeId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!merge) throw new NotFoundError('Merge');
    const involved = [merge.survivorId, ...merge.mergedIds];
    await lockRecords(involved, transaction);
    const block = await unmergeBlock(merge, transaction);
    if (block) throw new ConflictError(block.message, block.details);
    const statesBefore = new Map<number, RecordState>();
    for (const id of involved) statesBefore.set(id, await loadRecordState(id, transaction));

    const effects = merge.effects as MergeEffects;
    for (const row of merge.before.condition_records)
      await restoreRow('condition_records', row, transaction, ['revision', 'updated_at']);
    if (effects.insertedContributorIds?.length) {
      await sequelize.query('DELETE FROM record_contributors WHERE id IN (:ids)', {
        replacements: { ids: effects.insertedContributorIds },
        transaction,
      });
    }
    for (const table of childTables)
      for (const row of merge.before[table] ?? []) await restoreRow(table, row, transaction);
    await restoreBookmarks(merge, effects, transaction);

    for (const id of involved) {
      const changes = diffStates(statesBefore.get(id) as RecordState, await loadRecordState(id, transaction));
      await appendCurationRevision(
        id,
        actorId,
        'unmerge',
        [...changes, { field: 'merge', from: mergeId, to: null }],
        transaction,
      );
    }
    await merge.update({ undoneAt: new Date(), undoneBy: actorId }, { transaction });
    await AuditEntry.create(
      {
        actorId,
        action: 'record.unmerge',
        subjectType: 'merge',
        subjectId: String(mergeId),
        details: { survivorId: merge.survivorId, mergedIds: merge.mergedIds },
      },
      { transaction },
    );
    return involved;
  });
  return { mergeId, restored: (await curationRowsByIds(ids)).map(presentCurationRecord) };
}
