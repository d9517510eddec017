import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { RecordRevision } from '../../db/models';
import { ConflictError, NotFoundError } from '../../http/errors';
import type { FieldChange, RevisionAction } from '../../../shared/schemas/record-history';
import { loadRecordState } from '../../core/record-revisions';

/**
 * Appends a curation revision (merge, unmerge, retire, restore): bumps the record's revision counter and
 * updated_at and stores the changes with the record's state after them (records service's loadRecordState).
 * Unlike an edit, curation does not credit the curator as an editor of the record's content.
 */
export async function appendCurationRevision(
  recordId: number,
  actorId: number,
  action: Extract<RevisionAction, 'merge' | 'unmerge' | 'retire' | 'restore'>,
  changes: FieldChange[],
  transaction: Transaction,
): Promise<number> {
  const [row] = await sequelize.query<{ revision: number }>(
    'UPDATE condition_records SET revision = revision + 1, updated_at = now() WHERE id = :id RETURNING revision',
    { replacements: { id: recordId }, type: QueryTypes.SELECT, transaction },
  );
  const snapshot = await loadRecordState(recordId, transaction);
  const revision = await RecordRevision.create(
    {
      recordId,
      number: row.revision,
      authorId: actorId,
      action,
      changes,
      snapshot: snapshot as unknown as Record<string, unknown>,
    },
    { transaction },
  );
  return revision.id;
}

export interface LockedRecord {
  id: number;
  status: 'active' | 'merged' | 'retired';
  compoundId: number;
  authorId: number;
  mergedIntoId: number | null;
  retiredBy: number | null;
  idcode: string;
}

/** Locks records FOR UPDATE in id order (so two curators never deadlock); 404 naming any id that does not exist. */
export async function lockRecords(
  ids: readonly number[],
  transaction: Transaction,
): Promise<Map<number, LockedRecord>> {
  const rows = await sequelize.query<LockedRecord>(
    `SELECT r.id, r.status, r.compound_id AS "compoundId", r.author_id AS "authorId", r.merged_into_id AS "mergedIntoId",
            r.retired_by AS "retiredBy", c.idcode
     FROM condition_records r JOIN compounds c ON c.id = r.compound_id
     WHERE r.id IN (:ids) ORDER BY r.id FOR UPDATE OF r`,
    { replacements: { ids: [...ids] }, type: QueryTypes.SELECT, transaction },
  );
  const byId = new Map(rows.map((row) => [row.id, row]));
  const missing = ids.filter((id) => !byId.has(id));
  if (missing.length > 0)
    throw new NotFoundError(missing.length === 1 ? `Record ${missing[0]}` : `Records ${missing.join(', ')}`);
  return byId;
}

/** 409 unless every record is active, naming the ones that are not and why. */
export function requireActive(records: Iterable<LockedRecord>, what: string) {
  const inactive = [...records].filter((record) => record.status !== 'active');
  if (inactive.length === 0) return;
  const describe = (record: LockedRecord) =>
    record.status === 'merged'
      ? `record ${record.id} was merged into record ${record.mergedIntoId}`
      : `record ${record.id} is retired`;
  throw new ConflictError(`Only active records can be ${what}: ${inactive.map(describe).join('; ')}.`, {
    records: inactive.map((record) => ({ id: record.id, status: record.status, mergedIntoId: record.mergedIntoId })),
  });
}
