import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { AuditEntry } from '../../db/models';
import { ConflictError, ForbiddenError } from '../../http/errors';
import { roleAtLeast, type SessionUser } from '../../../shared/schemas/auth';
import type { StatusChangeResult } from '../../../shared/schemas/curation';
import { appendCurationRevision, lockRecords } from './revisions';

const isCurator = (user: SessionUser) => roleAtLeast(user.role, 'curator');

async function statusOf(id: number): Promise<StatusChangeResult> {
  const [row] = await sequelize.query<StatusChangeResult & { retiredAt: Date | null }>(
    'SELECT id, status, retired_reason AS "retiredReason", retired_at AS "retiredAt", revision FROM condition_records WHERE id = :id',
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return { ...row, retiredAt: row.retiredAt ? new Date(row.retiredAt).toISOString() : null };
}

/**
 * Retires an active record: it leaves lists (unless a status filter asks), search and Scout, but every row
 * stays and it can be restored. Curators and admins retire any record; a member may retire their own
 * (the same people who may edit it). A merged or already retired record answers 409.
 */
export async function retire(id: number, reason: string, user: SessionUser): Promise<StatusChangeResult> {
  await sequelize.transaction(async (transaction) => {
    const record = (await lockRecords([id], transaction)).get(id)!;
    if (!isCurator(user) && record.authorId !== user.id)
      throw new ForbiddenError('Only a curator, an admin or the record’s author may retire it.');
    if (record.status !== 'active') {
      throw new ConflictError(
        record.status === 'merged'
          ? `Record ${id} was merged into record ${record.mergedIntoId}; retire that record instead.`
          : `Record ${id} is already retired.`,
        { status: record.status },
      );
    }
    await sequelize.query(
      "UPDATE condition_records SET status = 'retired', retired_reason = :reason, retired_at = now(), retired_by = :userId WHERE id = :id",
      {
        replacements: { id, reason, userId: user.id },
        transaction,
      },
    );
    await appendCurationRevision(
      id,
      user.id,
      'retire',
      [
        { field: 'status', from: 'active', to: 'retired' },
        { field: 'retiredReason', from: null, to: reason },
      ],
      transaction,
    );
    await AuditEntry.create(
      { actorId: user.id, action: 'record.retire', subjectType: 'record', subjectId: String(id), details: { reason } },
      { transaction },
    );
  });
  return statusOf(id);
}

/**
 * Restores a retired record to active. Curators and admins restore any; a member may restore a record of
 * their own that they retired themselves (not one a curator retired).
 */
export async function restore(id: number, user: SessionUser): Promise<StatusChangeResult> {
  await sequelize.transaction(async (transaction) => {
    const record = (await lockRecords([id], transaction)).get(id)!;
    const ownRetirement = record.authorId === user.id && record.retiredBy === user.id;
    if (!isCurator(user) && !ownRetirement)
      throw new ForbiddenError('Only a curator or an admin may restore this record.');
    if (record.status !== 'retired')
      throw new ConflictError(`Record ${id} is not retired (it is ${record.status}).`, { status: record.status });
    const [{ reason }] = await sequelize.query<{ reason: string | null }>(
      'SELECT retired_reason AS reason FROM condition_records WHERE id = :id',
      { replacements: { id }, type: QueryTypes.SELECT, transaction },
    );
    await sequelize.query(
      "UPDATE condition_records SET status = 'active', retired_reason = NULL, retired_at = NULL, retired_by = NULL WHERE id = :id",
      { replacements: { id }, transaction },
    );
    await appendCurationRevision(
      id,
      user.id,
      'restore',
      [
        { field: 'status', from: 'retired', to: 'active' },
        { field: 'retiredReason', from: reason, to: null },
      ],
      transaction,
    );
    await AuditEntry.create(
      {
        actorId: user.id,
        action: 'record.restore',
        subjectType: 'record',
        subjectId: String(id),
        details: { previousReason: reason },
      },
      { transaction },
    );
  });
  return statusOf(id);
}
