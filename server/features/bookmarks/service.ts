import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { Bookmark, Compound, ConditionRecord } from '../../db/models';
import { ConflictError, NotFoundError, UnprocessableError } from '../../http/errors';
import type { BookmarkDto } from '../../../shared/schemas/bookmark';
import { presentBookmarks } from './presenters';
import { loadListRecords } from '../../core/record-queries';

type Target = { recordId?: number; compoundId?: number };

const whereTarget = (userId: number, target: Target) =>
  target.recordId !== undefined
    ? { userId, recordId: target.recordId }
    : { userId, compoundId: target.compoundId as number };

/** Every bookmark of a user, newest first, with the records and compounds they point to. */
export async function listBookmarks(userId: number): Promise<BookmarkDto[]> {
  return dtosOf(
    await Bookmark.findAll({
      where: { userId },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    }),
  );
}

async function dtosOf(bookmarks: Bookmark[]): Promise<BookmarkDto[]> {
  const recordIds = bookmarks.flatMap((bookmark) => (bookmark.recordId ? [bookmark.recordId] : []));
  const compoundIds = bookmarks.flatMap((bookmark) => (bookmark.compoundId ? [bookmark.compoundId] : []));
  const { records, photoCounts } = await loadListRecords(recordIds);
  const compounds = compoundIds.length ? await Compound.findAll({ where: { id: compoundIds } }) : [];
  const counts = compoundIds.length
    ? await sequelize.query<{ compound_id: number; n: string }>(
        "SELECT compound_id, count(*) AS n FROM condition_records WHERE compound_id IN (:ids) AND status = 'active' GROUP BY compound_id",
        { replacements: { ids: compoundIds }, type: QueryTypes.SELECT },
      )
    : [];
  return presentBookmarks(bookmarks, {
    records,
    photoCounts,
    compounds,
    recordCounts: new Map(counts.map((row) => [row.compound_id, Number(row.n)])),
  });
}

/** Checks the target exists and can be bookmarked: a merged record sends the user to its survivor. */
async function checkTarget(target: Target): Promise<void> {
  if (target.recordId !== undefined) {
    const record = await ConditionRecord.findByPk(target.recordId, { attributes: ['id', 'status', 'mergedIntoId'] });
    if (!record)
      throw new UnprocessableError(`No record with id ${target.recordId}.`, [
        { path: 'body.recordId', message: 'Unknown record.' },
      ]);
    if (record.status === 'merged') {
      throw new UnprocessableError(
        `Record ${record.id} was merged into record ${record.mergedIntoId}; bookmark that one.`,
        [{ path: 'body.recordId', message: 'Merged record.' }],
      );
    }
    return;
  }
  if (!(await Compound.findByPk(target.compoundId, { attributes: ['id'] }))) {
    throw new UnprocessableError(`No compound with id ${target.compoundId}.`, [
      { path: 'body.compoundId', message: 'Unknown compound.' },
    ]);
  }
}

/** Bookmarks a record or compound for the user; 409 when it is bookmarked already. */
export async function addBookmark(userId: number, input: Target & { note: string | null }): Promise<BookmarkDto> {
  await checkTarget(input);
  const existing = await Bookmark.findOne({ where: whereTarget(userId, input) });
  if (existing) throw new ConflictError('Already bookmarked.', { bookmarkId: existing.id });
  const bookmark = await Bookmark.create({
    userId,
    recordId: input.recordId ?? null,
    compoundId: input.compoundId ?? null,
    note: input.note,
  });
  return (await dtosOf([bookmark]))[0];
}

async function ownBookmark(userId: number, id: number): Promise<Bookmark> {
  const bookmark = await Bookmark.findOne({ where: { id, userId } });
  if (!bookmark) throw new NotFoundError('Bookmark');
  return bookmark;
}

export async function updateBookmarkNote(userId: number, id: number, note: string | null): Promise<BookmarkDto> {
  const bookmark = await ownBookmark(userId, id);
  await bookmark.update({ note });
  return (await dtosOf([bookmark]))[0];
}

export async function removeBookmark(userId: number, id: number): Promise<void> {
  await (await ownBookmark(userId, id)).destroy();
}

/** Removes the user's bookmark of a record or compound; 404 when there is none. */
export async function removeBookmarkOf(userId: number, target: Target): Promise<void> {
  const removed = await Bookmark.destroy({ where: whereTarget(userId, target) });
  if (removed === 0) throw new NotFoundError('Bookmark');
}
