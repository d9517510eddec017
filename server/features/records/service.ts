import { sequelize } from '../../db/sequelize';
import { ConditionRecord, RecordSpot, RecordVisualisation } from '../../db/models';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../../http/errors';
import { roleAtLeast, type SessionUser } from '../../../shared/schemas/auth';
import type { RecordInputParsed, RecordUpdateParsed } from '../../../shared/schemas/record';
import { resolveCompound } from '../../core/compounds';
import type { RecordContent } from '../../core/record-columns';
import { addRevision, diffStates, loadRecordState } from '../../core/record-revisions';
import { contentColumns, insertRecord, writeSpots, writeVisualisations } from '../../core/record-rows';

/** Members edit their own records; curators and admins edit any. */
export function canEditRecord(user: SessionUser | undefined, record: Pick<ConditionRecord, 'authorId'>): boolean {
  if (!user) return false;
  if (roleAtLeast(user.role, 'curator')) return true;
  return user.role === 'member' && record.authorId === user.id;
}

async function findRecord(id: number): Promise<ConditionRecord> {
  const record = await ConditionRecord.findByPk(id);
  if (!record) throw new NotFoundError('Record');
  return record;
}

function requireEditable(user: SessionUser, record: ConditionRecord) {
  if (!canEditRecord(user, record))
    throw new ForbiddenError('Only the record’s author, a curator or an admin may change it.');
  if (record.status === 'merged') {
    throw new ConflictError(`This record was merged into record ${record.mergedIntoId}; change that record instead.`, {
      mergedIntoId: record.mergedIntoId,
    });
  }
}

/** Creates a record from a validated POST body: finds or creates the compound, then writes every row in one transaction. */
export async function createRecord(input: RecordInputParsed, user: SessionUser): Promise<ConditionRecord> {
  return sequelize.transaction(async (transaction) => {
    const compound = await resolveCompound(input, user.id, transaction);
    const { structure: _structure, compoundId: _compoundId, name: _name, ...fields } = input;
    return insertRecord({ ...fields, compoundId: compound.id }, { authorId: user.id, transaction });
  });
}

/** Applies a PATCH: only the given fields change; a revision keeps the field-level differences. */
export async function updateRecord(id: number, patch: RecordUpdateParsed, user: SessionUser): Promise<ConditionRecord> {
  requireEditable(user, await findRecord(id));
  return sequelize.transaction(async (transaction) => {
    const record = await ConditionRecord.findByPk(id, {
      transaction,
      lock: transaction.LOCK.UPDATE,
      rejectOnEmpty: true,
    });
    if (patch.expectedRevision !== undefined && patch.expectedRevision !== record.revision) {
      throw new ConflictError(
        `The record changed since you opened it (revision ${record.revision}, yours ${patch.expectedRevision}); reload and edit again.`,
        { revision: record.revision },
      );
    }
    const before = await loadRecordState(id, transaction);
    const compoundId =
      patch.structure !== undefined || patch.compoundId !== undefined
        ? (await resolveCompound(patch, user.id, transaction)).id
        : record.compoundId;
    const content: RecordContent = {
      compoundId,
      technique: patch.technique ?? record.technique,
      stationaryPhase: patch.stationaryPhase ?? record.stationaryPhase,
      stationaryPhaseOther:
        patch.stationaryPhaseOther !== undefined ? patch.stationaryPhaseOther : record.stationaryPhaseOther,
      eluent: patch.eluent ?? record.eluent,
      spots: patch.spots ?? (before.spots.map((spot) => ({ ...spot })) as RecordContent['spots']),
      visualisation: patch.visualisation ?? before.visualisations,
      outcome: patch.outcome ?? record.outcome,
      outcomeReason: patch.outcomeReason !== undefined ? patch.outcomeReason : record.outcomeReason,
      column: patch.column !== undefined ? patch.column : (before.column as RecordContent['column']),
      notebookRef: patch.notebookRef !== undefined ? patch.notebookRef : record.notebookRef,
      notes: patch.notes !== undefined ? patch.notes : record.notes,
      runOn: patch.runOn !== undefined ? patch.runOn : record.runOn,
    };
    if (content.stationaryPhase === 'other' && !content.stationaryPhaseOther) {
      throw new ValidationError('stationaryPhaseOther: Name the stationary phase when choosing "other".', [
        { path: 'body.stationaryPhaseOther', message: 'Name the stationary phase when choosing "other".' },
      ]);
    }
    if (content.stationaryPhase !== 'other') content.stationaryPhaseOther = null;
    await record.update(contentColumns(content), { transaction });
    if (patch.spots) {
      await RecordSpot.destroy({ where: { recordId: id }, transaction });
      await writeSpots(id, patch.spots, transaction);
    }
    if (patch.visualisation) {
      await RecordVisualisation.destroy({ where: { recordId: id }, transaction });
      await writeVisualisations(id, patch.visualisation, transaction);
    }
    const changes = diffStates(before, await loadRecordState(id, transaction));
    if (changes.length > 0) await addRevision(id, user.id, 'update', changes, transaction);
    return record.reload({ transaction });
  });
}
