import { Op } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { AuditEntry, DuplicateDismissal } from '../../db/models';
import { NotFoundError } from '../../http/errors';
import { duplicateTolerances } from '../../../shared/domain/duplicate-conditions';
import type { DuplicatesResponse } from '../../../shared/schemas/curation';
import { activeCurationRows, curationRowsByIds, groupSignature } from './records';
import { sameConditionGroups } from './conditions-groups';
import { sameStructureGroups } from './structure-groups';

/**
 * Candidate duplicate groups among active records, most certain first, without the groups a curator
 * dismissed while their records stayed unchanged (signature match, see recordSignature).
 */
export async function findDuplicateGroups(): Promise<DuplicatesResponse> {
  const rows = await activeCurationRows();
  const groups = [...sameConditionGroups(rows), ...sameStructureGroups(rows)];
  const signatures = groups.map((group) => group.signature);
  const dismissed =
    signatures.length === 0
      ? []
      : await DuplicateDismissal.findAll({ where: { signature: { [Op.in]: signatures } }, attributes: ['signature'] });
  const hidden = new Set(dismissed.map((row) => row.signature));
  const open = groups
    .filter((group) => !hidden.has(group.signature))
    .sort((a, b) => b.score - a.score || a.recordIds[0] - b.recordIds[0]);
  return {
    groups: open,
    dismissedCount: groups.length - open.length,
    rules: { rfTolerance: duplicateTolerances.rf, ratioRelativeTolerance: duplicateTolerances.ratioRelative },
  };
}

/** Records a curator's dismissal of a group as it stands now; it stops applying once any record changes. */
export async function dismissGroup(input: { recordIds: number[]; reason: string }, actorId: number) {
  const rows = await curationRowsByIds(input.recordIds);
  if (rows.length !== input.recordIds.length) {
    const missing = input.recordIds.filter((id) => !rows.some((row) => row.id === id));
    throw new NotFoundError(`Record ${missing.join(', ')}`);
  }
  const signature = groupSignature(rows);
  const recordIds = [...input.recordIds].sort((a, b) => a - b);
  return sequelize.transaction(async (transaction) => {
    const dismissal = await DuplicateDismissal.create(
      { recordIds, signature, reason: input.reason, actorId },
      { transaction },
    );
    await AuditEntry.create(
      {
        actorId,
        action: 'duplicates.dismiss',
        subjectType: 'duplicate-group',
        subjectId: recordIds.join(','),
        details: { signature, reason: input.reason },
      },
      { transaction },
    );
    return { id: dismissal.id, recordIds, signature, reason: input.reason };
  });
}
