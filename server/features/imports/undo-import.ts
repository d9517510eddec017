import { QueryTypes, type Transaction } from 'sequelize';
import type { SessionUser } from '../../../shared/schemas/auth';
import { sequelize } from '../../db/sequelize';
import { AuditEntry, Import } from '../../db/models';
import { ConflictError, NotFoundError } from '../../http/errors';
import type { UndoPlan } from '../../../shared/schemas/import';

/** The reason every record retired by undoing import `id` carries. */
const undoReason = (id: number) => `import ${id} undone`;

/** The records of an import the undo leaves alone: survivors of a merge with records outside the undo. */
const KEPT_SURVIVOR = `EXISTS (SELECT 1 FROM condition_records m WHERE m.merged_into_id = r.id AND m.status = 'merged')`;

/** What undoing import `id` would do, in numbers and words, read without changing anything. */
export async function undoPlan(id: number, transaction?: Transaction): Promise<UndoPlan> {
  const importRow = await Import.findByPk(id, { transaction });
  if (!importRow) throw new NotFoundError('Import');
  const rows = await sequelize.query<{
    id: number;
    status: string;
    mergedIntoId: number | null;
    edited: boolean;
    absorbed: number[] | null;
  }>(
    `SELECT r.id, r.status, r.merged_into_id AS "mergedIntoId",
            EXISTS (SELECT 1 FROM record_revisions v WHERE v.record_id = r.id AND v.action IN ('update', 'photo-add',
              'photo-remove', 'restore')) AS edited,
            (SELECT array_agg(m.id ORDER BY m.id) FROM condition_records m WHERE m.merged_into_id = r.id
              AND m.status = 'merged') AS absorbed
       FROM condition_records r WHERE r.import_id = :id ORDER BY r.id`,
    { replacements: { id }, type: QueryTypes.SELECT, transaction },
  );
  const active = rows.filter((row) => row.status === 'active');
  const keptSurvivors = active
    .filter((row) => row.absorbed && row.absorbed.length > 0)
    .map((row) => ({ id: row.id, absorbed: row.absorbed as number[] }));
  const retiring = active.filter((row) => !row.absorbed || row.absorbed.length === 0);
  const edited = retiring.filter((row) => row.edited).map((row) => row.id);
  const mergedAway = rows
    .filter((row) => row.status === 'merged' && row.mergedIntoId !== null)
    .map((row) => ({ id: row.id, into: row.mergedIntoId as number }));
  const alreadyRetired = rows.filter((row) => row.status === 'retired').length;
  const parts = [
    `Retires ${retiring.length} record${retiring.length === 1 ? '' : 's'} this import added (kept for audit, restorable one by one)`,
    edited.length ? `${edited.length} of them edited since the import (records ${edited.join(', ')})` : '',
    keptSurvivors.length
      ? `keeps ${keptSurvivors.length} that other records were merged into (records ` +
        `${keptSurvivors.map((item) => item.id).join(', ')}), so the merged data stays whole`
      : '',
    mergedAway.length
      ? `leaves ${mergedAway.length} merged into other records as they are ` +
        `(${mergedAway.map((item) => `${item.id} → ${item.into}`).join(', ')})`
      : '',
    alreadyRetired ? `${alreadyRetired} already retired stay retired` : '',
  ].filter(Boolean);
  return {
    importId: id,
    status: importRow.status as UndoPlan['status'],
    retire: retiring.length,
    edited,
    keptSurvivors,
    mergedAway,
    alreadyRetired,
    summary: `${parts.join('; ')}.`,
  };
}

/**
 * Undoes an import: every record it added that is still active is retired (kept for audit, restorable one by
 * one) with the reason "import N undone", each with a 'retire' revision whose snapshot is its last one with
 * the new status, as curation's retire leaves it. Records merged since stay as the merge left them: one merged into
 * another record stays merged, and one that other records were merged into stays active (retiring it would hide
 * their data), so records, merges and the import agree; the import keeps the plan it followed. 409 while the import
 * runs or once it is undone.
 */
export async function undoImport(id: number, user: SessionUser): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const importRow = await Import.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!importRow) throw new NotFoundError('Import');
    if (importRow.status === 'running')
      throw new ConflictError(`Import ${id} is still running; wait for it to finish or fail before undoing it.`, {
        status: importRow.status,
      });
    if (importRow.status === 'undone')
      throw new ConflictError(`Import ${id} was already undone.`, { status: importRow.status });
    const plan = await undoPlan(id, transaction);
    const reason = undoReason(id);
    const changes = JSON.stringify([
      { field: 'status', from: 'active', to: 'retired' },
      { field: 'retiredReason', from: null, to: reason },
    ]);
    const [{ retired }] = await sequelize.query<{ retired: number }>(
      `WITH target AS (
         SELECT r.id FROM condition_records r WHERE r.import_id = :id AND r.status = 'active'
           AND NOT ${KEPT_SURVIVOR} ORDER BY r.id FOR UPDATE
       ), bumped AS (
         UPDATE condition_records r
            SET status = 'retired', retired_reason = :reason, retired_at = now(), retired_by = :userId,
                revision = r.revision + 1, updated_at = now()
           FROM target WHERE r.id = target.id
         RETURNING r.id, r.revision
       ), revision_rows AS (
         INSERT INTO record_revisions (record_id, number, author_id, action, changes, snapshot, at)
         SELECT b.id, b.revision, :userId, 'retire', CAST(:changes AS jsonb), jsonb_set(last.snapshot, '{status}', '"retired"'), now()
           FROM bumped b
           JOIN LATERAL (SELECT snapshot FROM record_revisions WHERE record_id = b.id ORDER BY number DESC LIMIT 1) last ON true
         RETURNING 1
       )
       SELECT (SELECT count(*) FROM bumped)::int AS retired`,
      { replacements: { id, reason, userId: user.id, changes }, type: QueryTypes.SELECT, transaction },
    );
    await importRow.update(
      { status: 'undone', undoneAt: new Date(), undoneBy: user.id, retiredRecords: retired },
      { transaction },
    );
    await AuditEntry.create(
      {
        actorId: user.id,
        action: 'import.undo',
        subjectType: 'import',
        subjectId: String(id),
        details: {
          retired,
          reason,
          plan: plan.summary,
          keptSurvivors: plan.keptSurvivors,
          mergedAway: plan.mergedAway,
          edited: plan.edited,
        },
      },
      { transaction },
    );
  });
}
