import { Op } from 'sequelize';
import { RecordMerge, User } from '../../db/models';
import type { MergeHistoryItem } from '../../../shared/schemas/curation';
import { unmergeBlock } from './unmerge';

/** Recent merges, newest first (optionally those involving one record), each saying whether it can be undone now. */
export async function mergeHistory(options: { recordId?: number; limit: number }): Promise<MergeHistoryItem[]> {
  const where = options.recordId
    ? { [Op.or]: [{ survivorId: options.recordId }, { mergedIds: { [Op.contains]: [options.recordId] } }] }
    : {};
  const merges = await RecordMerge.findAll({
    where,
    order: [['id', 'DESC']],
    limit: options.limit,
    attributes: { exclude: ['before'] },
  });
  const userIds = [...new Set(merges.flatMap((merge) => [merge.actorId, merge.undoneBy ?? merge.actorId]))];
  const names = new Map(
    (await User.findAll({ where: { id: userIds }, attributes: ['id', 'name'] })).map((user) => [user.id, user.name]),
  );
  const person = (id: number) => ({ id, name: names.get(id) ?? 'unknown' });
  const items: MergeHistoryItem[] = [];
  for (const merge of merges) {
    const block = await unmergeBlock(merge);
    items.push({
      id: merge.id,
      survivorId: merge.survivorId,
      mergedIds: merge.mergedIds,
      fields: merge.fields,
      actor: person(merge.actorId),
      at: merge.at.toISOString(),
      undoneAt: merge.undoneAt ? merge.undoneAt.toISOString() : null,
      undoneBy: merge.undoneBy ? person(merge.undoneBy) : null,
      blockedReason: merge.undoneAt ? null : (block?.message ?? null),
    });
  }
  return items;
}
