import { QueryTypes } from 'sequelize';
import type { SessionUser } from '../../../shared/schemas/auth';
import { sequelize } from '../../db/sequelize';
import { AuditEntry, Import } from '../../db/models';
import { ConflictError, NotFoundError } from '../../http/errors';

/** The reason every record retired by undoing import `id` carries. */
export const undoReason = (id: number) => `import ${id} undone`;

/**
 * Undoes an import: every record it added that is still active is retired (kept for audit, restorable one by
 * one) with the reason "import N undone", each with a 'retire' revision whose snapshot is its last one with
 * the new status, as curation's retire leaves it. Merged records are left alone. 409 while the import runs
 * or once it is undone.
 */
export async function undoImport(id: number, user: SessionUser): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const importRow = await Import.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!importRow) throw new NotFoundError('Import');
    if (importRow.status === 'running') throw new ConflictError(`Import ${id} is still running; wait for it to finish or fail before undoing it.`, { status: importRow.status });
    if (importRow.status === 'undone') throw new ConflictError(`Import ${id} was already undone.`, { status: importRow.status });
    const reason = undoReason(id);
    const changes = JSON.stringify([{ field: 'status', from: 'active', to: 'retired' }, { field: 'retiredReason', from: null, to: reason }]);
    const [{ retired }] = await sequelize.query<{ retired: number }>(
      `WITH target AS (
         SELECT id FROM condition_records WHERE import_id = :id AND status = 'active' ORDER BY id FOR UPDATE
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
    await importRow.update({ status: 'undone', undoneAt: new Date(), undoneBy: user.id, retiredRecords: retired }, { transaction });
    await AuditEntry.create({ actorId: user.id, action: 'import.undo', subjectType: 'import', subjectId: String(id), details: { retired, reason } }, { transaction });
  });
}
