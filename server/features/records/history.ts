import { ConditionRecord, RecordRevision, User } from '../../db/models';
import { NotFoundError } from '../../http/errors';
import type { RecordHistory } from '../../../shared/schemas/record-history';

/** Every revision of a record, newest first, with who made it and the field-level changes. */
export async function recordHistory(recordId: number): Promise<RecordHistory> {
  if (!(await ConditionRecord.findByPk(recordId, { attributes: ['id'] }))) throw new NotFoundError('Record');
  const revisions = (await RecordRevision.findAll({
    where: { recordId },
    include: [{ model: User, as: 'author', attributes: ['id', 'name'] }],
    order: [
      ['number', 'DESC'],
      ['id', 'DESC'],
    ],
  })) as (RecordRevision & { author: User | null })[];
  return {
    recordId,
    revisions: revisions.map((revision) => ({
      number: revision.number,
      action: revision.action,
      at: revision.at.toISOString(),
      author: revision.author ? { id: revision.author.id, name: revision.author.name } : null,
      changes: revision.changes,
    })),
  };
}
