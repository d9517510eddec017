import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { hasBookmarks } from './snapshot';

/**
 * Which rows of the merged records move to the survivor. A united record names each stain once and has one
 * target spot: a visualisation (method and note) the survivor already has, or an earlier merged record brings,
 * stays on its own merged record; so does every merged target spot when the survivor has a target (else only
 * the first merged record's target moves). Nothing is deleted: rows that stay are still read on the merged
 * record's page, and an unmerge restores every row from the before-dump as before.
 */
const movingRows: Record<'record_spots' | 'record_visualisations', string> = {
  record_spots: `
    SELECT s.id, s.record_id, s.position FROM record_spots s
    WHERE s.record_id IN (:mergedIds)
      AND (s.role <> 'target' OR (
        NOT EXISTS (SELECT 1 FROM record_spots t WHERE t.record_id = :survivorId AND t.role = 'target')
        AND s.id = (SELECT f.id FROM record_spots f WHERE f.record_id IN (:mergedIds) AND f.role = 'target'
                    ORDER BY array_position(ARRAY[:mergedIds]::int[], f.record_id), f.position, f.id LIMIT 1)))`,
  record_visualisations: `
    SELECT DISTINCT ON (v.method, coalesce(v.note, '')) v.id, v.record_id, v.position FROM record_visualisations v
    WHERE v.record_id IN (:mergedIds)
      AND NOT EXISTS (SELECT 1 FROM record_visualisations k
                      WHERE k.record_id = :survivorId AND k.method = v.method AND coalesce(k.note, '') = coalesce(v.note, ''))
    ORDER BY v.method, coalesce(v.note, ''), array_position(ARRAY[:mergedIds]::int[], v.record_id), v.position, v.id`,
};

/**
 * Moves the merged records' spots and visualisations to the survivor (those `movingRows` lets through), after
 * its own (positions continue from the survivor's last, merged records in the order given), and their photos.
 * Every row keeps its `origin_record_id`, so the united record still tells which plate each spot came from.
 */
export async function moveChildRows(survivorId: number, mergedIds: readonly number[], transaction: Transaction) {
  for (const table of ['record_spots', 'record_visualisations'] as const) {
    await sequelize.query(
      `UPDATE ${table} x SET record_id = :survivorId, position = base.next + moved.rank - 1
       FROM (SELECT coalesce(max(position) + 1, 0) AS next FROM ${table} WHERE record_id = :survivorId) base,
            (SELECT id, row_number() OVER (ORDER BY array_position(ARRAY[:mergedIds]::int[], record_id), position, id) AS rank
             FROM (${movingRows[table]}) candidates) moved
       WHERE x.id = moved.id`,
      { replacements: { survivorId, mergedIds: [...mergedIds] }, transaction },
    );
  }
  await sequelize.query('UPDATE record_photos SET record_id = :survivorId WHERE record_id IN (:mergedIds)', {
    replacements: { survivorId, mergedIds: [...mergedIds] },
    transaction,
  });
}

/**
 * Credits on the survivor everyone credited on a merged record (its author, editors and earlier
 * merged-from credits) as 'merged-from' via that record. Returns the ids of the rows it added.
 */
export async function creditContributors(
  survivorId: number,
  mergedIds: readonly number[],
  transaction: Transaction,
): Promise<number[]> {
  const rows = await sequelize.query<{ id: number }>(
    `INSERT INTO record_contributors (record_id, user_id, role, via_record_id, created_at)
     SELECT DISTINCT :survivorId, credited.user_id, 'merged-from', credited.record_id, now() FROM (
       SELECT record_id, user_id FROM record_contributors WHERE record_id IN (:mergedIds)
       UNION SELECT id, author_id FROM condition_records WHERE id IN (:mergedIds)
     ) credited
     ON CONFLICT DO NOTHING RETURNING id`,
    { replacements: { survivorId, mergedIds: [...mergedIds] }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((row) => Number(row.id));
}

interface BookmarkRow {
  id: number;
  userId: number;
  recordId: number;
  note: string | null;
}

const joinNote = (kept: string | null, fromRecord: number, moved: string | null) => {
  if (!moved?.trim()) return kept;
  const line = `[Bookmark note from record #${fromRecord}] ${moved.trim()}`;
  return kept?.trim() ? `${kept.trim()}\n${line}` : line;
};

/**
 * Moves bookmarks of the merged records to the survivor. A user who already has a bookmark there keeps one:
 * the moved bookmark's note is appended to it and the duplicate row deleted (it stays in the merge's
 * before-snapshot, so an unmerge puts it back). Returns deleted ids, where each went, and the notes written.
 */
export async function uniteBookmarks(survivorId: number, mergedIds: readonly number[], transaction: Transaction) {
  const effects = {
    deletedBookmarkIds: [] as number[],
    bookmarkUnitedInto: {} as Record<string, number>,
    bookmarkNotesAfter: {} as Record<string, string | null>,
  };
  if (!(await hasBookmarks(transaction))) return effects;
  const moving = await sequelize.query<BookmarkRow>(
    `SELECT id, user_id AS "userId", record_id AS "recordId", note FROM bookmarks WHERE record_id IN (:mergedIds)
     ORDER BY array_position(ARRAY[:mergedIds]::int[], record_id), id`,
    { replacements: { mergedIds: [...mergedIds] }, type: QueryTypes.SELECT, transaction },
  );
  for (const bookmark of moving) {
    const [kept] = await sequelize.query<BookmarkRow>(
      'SELECT id, note FROM bookmarks WHERE record_id = :survivorId AND user_id = :userId ORDER BY id LIMIT 1',
      { replacements: { survivorId, userId: bookmark.userId }, type: QueryTypes.SELECT, transaction },
    );
    if (!kept) {
      await sequelize.query('UPDATE bookmarks SET record_id = :survivorId WHERE id = :id', {
        replacements: { survivorId, id: bookmark.id },
        transaction,
      });
      continue;
    }
    const note = joinNote(kept.note, bookmark.recordId, bookmark.note);
    if (note !== kept.note) {
      await sequelize.query('UPDATE bookmarks SET note = :note WHERE id = :id', {
        replacements: { note, id: kept.id },
        transaction,
      });
      effects.bookmarkNotesAfter[String(kept.id)] = note;
    }
    await sequelize.query('DELETE FROM bookmarks WHERE id = :id', { replacements: { id: bookmark.id }, transaction });
    effects.deletedBookmarkIds.push(Number(bookmark.id));
    effects.bookmarkUnitedInto[String(bookmark.id)] = Number(kept.id);
  }
  return effects;
}
