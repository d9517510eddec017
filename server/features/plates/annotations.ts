import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { ForbiddenError, NotFoundError } from '../../http/errors';
import { roleAtLeast, type SessionUser } from '../../../shared/schemas/auth';
import type { PhotoAnnotation, PlateAnnotation } from '../../../shared/schemas/plates';

type Row = { photo_id: number; revision: number; annotation: PlateAnnotation; saved_by: string | null; saved_at: Date };

const present = (row: Row): PhotoAnnotation => ({
  photoId: row.photo_id,
  revision: row.revision,
  annotation: row.annotation,
  savedBy: row.saved_by,
  savedAt: new Date(row.saved_at).toISOString(),
});

const SELECT = `SELECT a.photo_id, a.revision, a.annotation, u.name AS saved_by, a.saved_at
  FROM photo_annotations a LEFT JOIN users u ON u.id = a.saved_by`;

async function photoOwner(photoId: number): Promise<{ authorId: number; uploadedBy: number | null }> {
  const rows = await sequelize.query<{ author_id: number; uploaded_by: number | null }>(
    `SELECT r.author_id, p.uploaded_by FROM record_photos p JOIN condition_records r ON r.id = p.record_id
     WHERE p.id = :photoId AND p.removed_at IS NULL`,
    { replacements: { photoId }, type: QueryTypes.SELECT },
  );
  if (rows.length === 0) throw new NotFoundError('Photo');
  return { authorId: rows[0].author_id, uploadedBy: rows[0].uploaded_by };
}

/** The current annotation of a record photo (its newest revision); 404 when the photo has none. */
export async function currentAnnotation(photoId: number): Promise<PhotoAnnotation> {
  await photoOwner(photoId);
  const rows = await sequelize.query<Row>(`${SELECT} WHERE a.photo_id = :photoId ORDER BY a.revision DESC LIMIT 1`, {
    replacements: { photoId },
    type: QueryTypes.SELECT,
  });
  if (rows.length === 0) throw new NotFoundError('Annotation');
  return present(rows[0]);
}

/** Every revision of a photo's annotation, newest first. */
export async function annotationHistory(photoId: number): Promise<PhotoAnnotation[]> {
  await photoOwner(photoId);
  const rows = await sequelize.query<Row>(`${SELECT} WHERE a.photo_id = :photoId ORDER BY a.revision DESC`, {
    replacements: { photoId },
    type: QueryTypes.SELECT,
  });
  return rows.map(present);
}

/**
 * Saves a new revision of a photo's annotation (the record's author, the photo's uploader, a curator or an admin,
 * as for the photo itself); earlier revisions stay.
 */
export async function saveAnnotation(
  photoId: number,
  annotation: PlateAnnotation,
  user: SessionUser,
): Promise<PhotoAnnotation> {
  const owner = await photoOwner(photoId);
  const allowed =
    roleAtLeast(user.role, 'curator') ||
    (user.role === 'member' && (owner.authorId === user.id || owner.uploadedBy === user.id));
  if (!allowed)
    throw new ForbiddenError(
      'Only the record’s author, the photo’s uploader, a curator or an admin may mark this photo.',
    );
  await sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT id FROM record_photos WHERE id = :photoId FOR UPDATE', {
      replacements: { photoId },
      transaction,
    });
    await sequelize.query(
      `INSERT INTO photo_annotations (photo_id, revision, annotation, saved_by)
       SELECT :photoId, COALESCE(MAX(revision), 0) + 1, CAST(:annotation AS jsonb), :userId FROM photo_annotations
         WHERE photo_id = :photoId`,
      { replacements: { photoId, annotation: JSON.stringify(annotation), userId: user.id }, transaction },
    );
  });
  return currentAnnotation(photoId);
}
