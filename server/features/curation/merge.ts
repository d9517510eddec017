import { sequelize } from '../../db/sequelize';
import { AuditEntry, RecordMerge } from '../../db/models';
import { ConflictError } from '../../http/errors';
import type { MergeableField, MergeResult } from '../../../shared/schemas/curation';
import type { MergeEffects } from '../../db/models/record-merge';
import { presentCurationRecord } from './presenters';
import { diffStates, loadRecordState } from '../../core/record-revisions';
import { appendCurationRevision, lockRecords, requireActive, type LockedRecord } from './revisions';
import { dumpRows, recordDigests } from './snapshot';
import { applyFieldChoices, refreshDerivedColumns, unitedNotes } from './merge-fields';
import { creditContributors, moveChildRows, uniteBookmarks } from './merge-rows';
import { curationRowsByIds } from './records';
import { readStereo } from './structures';

export interface MergeRequest {
  survivorId: number;
  mergedIds: number[];
  fields: Partial<Record<MergeableField, number>>;
}

/**
 * Records of one compound merge; so do records of two compound entries of one structure that differ only
 * in drawn stereo (same skeleton, see readStereo) — the same-structure duplicates — with `compound` a
 * choosable field. Anything else is refused with 409: merging different substances would lose meaning.
 */
function requireOneSubstance(records: LockedRecord[]) {
  if (new Set(records.map((record) => record.compoundId)).size === 1) return;
  if (new Set(records.map((record) => readStereo(record.idcode).skeleton)).size === 1) return;
  throw new ConflictError(
    `Records of different compounds cannot be merged ` +
      `(${records.map((record) => `record ${record.id}: compound ${record.compoundId}`).join(', ')}).`,
    { compounds: records.map((record) => ({ recordId: record.id, compoundId: record.compoundId })) },
  );
}

/**
 * Merges records into a survivor in one transaction: field choices applied to the survivor, notes appended
 * with attribution, spots, visualisations, photos and bookmarks united on it, every contributor credited,
 * merged records marked 'merged' and pointed at the survivor, revisions on each record and an audit entry.
 * The before-snapshot stored with the merge lets unmergeRecords restore every row exactly.
 */
export async function mergeRecords(request: MergeRequest, actorId: number): Promise<MergeResult> {
  const { survivorId, mergedIds, fields } = request;
  const allIds = [survivorId, ...mergedIds];
  const mergeId = await sequelize.transaction(async (transaction) => {
    const locked = await lockRecords(allIds, transaction);
    requireActive(locked.values(), 'merged');
    requireOneSubstance([...locked.values()]);
    const before = await dumpRows(allIds, transaction);
    const merge = await RecordMerge.create({ survivorId, mergedIds, fields, before, actorId }, { transaction });
    const survivorBefore = await loadRecordState(survivorId, transaction);
    const [survivorRow, ...mergedRows] = await curationRowsByIds(allIds, transaction);

    await applyFieldChoices(survivorId, fields, transaction);
    await sequelize.query('UPDATE condition_records SET notes = :notes WHERE id = :id', {
      replacements: { id: survivorId, notes: unitedNotes(survivorRow.notes, mergedRows) },
      transaction,
    });
    await moveChildRows(survivorId, mergedIds, transaction);
    const insertedContributorIds = await creditContributors(survivorId, mergedIds, transaction);
    const bookmarks = await uniteBookmarks(survivorId, mergedIds, transaction);
    await refreshDerivedColumns(survivorId, transaction);
    await sequelize.query(
      "UPDATE condition_records SET status = 'merged', merged_into_id = :survivorId WHERE id IN (:mergedIds)",
      {
        replacements: { survivorId, mergedIds },
        transaction,
      },
    );

    const revisionIds = [];
    const survivorChanges = [
      ...diffStates(survivorBefore, await loadRecordState(survivorId, transaction)),
      { field: 'mergedRecords', from: null, to: mergedIds },
    ];
    revisionIds.push(await appendCurationRevision(survivorId, actorId, 'merge', survivorChanges, transaction));
    for (const id of mergedIds) {
      const changes = [
        { field: 'status', from: 'active', to: 'merged' },
        { field: 'mergedIntoId', from: null, to: survivorId },
      ];
      revisionIds.push(await appendCurationRevision(id, actorId, 'merge', changes, transaction));
    }
    const effects: MergeEffects = { insertedContributorIds, ...bookmarks, revisionIds: revisionIds.map(Number) };
    await merge.update({ afterDigests: await recordDigests(allIds, transaction), effects }, { transaction });
    await AuditEntry.create(
      {
        actorId,
        action: 'record.merge',
        subjectType: 'merge',
        subjectId: String(merge.id),
        details: {
          survivorId,
          mergedIds,
          fields,
          changedFields: survivorChanges.map((change) => change.field),
          deletedBookmarkIds: bookmarks.deletedBookmarkIds,
        },
      },
      { transaction },
    );
    return merge.id;
  });
  const [survivor, ...merged] = await curationRowsByIds(allIds);
  return { mergeId, survivor: presentCurationRecord(survivor), merged: merged.map(presentCurationRecord) };
}
