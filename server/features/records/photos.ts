import sharp from 'sharp';
import { createHash } from 'node:crypto';
import { sequelize } from '../../db/sequelize';
import { ConditionRecord, RecordPhoto } from '../../db/models';
import { ConflictError, ForbiddenError, NotFoundError, UnprocessableError } from '../../http/errors';
import { sniffPhoto } from '../../storage/photo-sniff';
import { roleAtLeast, type SessionUser } from '../../../shared/schemas/auth';
import { blobStorage } from '../../storage';
import { canEditRecord } from './service';
import { addRevision } from '../../core/record-revisions';
import type { PhotoContentType } from '../../db/models/record-photo';

export { MAX_PHOTO_BYTES } from '../../storage/photo-sniff';
/** Thumbnails fit in this square, px, as WebP. */
const THUMB_SIZE_PX = 320;

/** The thumbnail; an image whose header reads but whose pixels do not (truncated, damaged) is refused with 422. */
async function thumbnail(bytes: Buffer, contentType: PhotoContentType): Promise<Buffer> {
  try {
    return await sharp(bytes)
      .rotate()
      .resize({ width: THUMB_SIZE_PX, height: THUMB_SIZE_PX, fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 78 })
      .toBuffer();
  } catch {
    throw new UnprocessableError(
      `The file starts like ${contentType} but its image data cannot be decoded (truncated or damaged); upload the photo again.`,
    );
  }
}

/** Adds a plate photo to a record (author, curator or admin): stores the bytes and a thumbnail, and a revision. */
export async function addPhoto(
  recordId: number,
  file: { buffer: Buffer; originalname?: string },
  user: SessionUser,
): Promise<RecordPhoto> {
  const record = await ConditionRecord.findByPk(recordId);
  if (!record) throw new NotFoundError('Record');
  if (!canEditRecord(user, record))
    throw new ForbiddenError('Only the record’s author, a curator or an admin may add photos.');
  if (record.status === 'merged')
    throw new ConflictError(`This record was merged into record ${record.mergedIntoId}; add the photo there.`);
  const { contentType, width, height } = await sniffPhoto(file.buffer);
  const thumb = await thumbnail(file.buffer, contentType);
  return sequelize.transaction(async (transaction) => {
    const storage = blobStorage();
    const blobKey = await storage.put(file.buffer, contentType, transaction);
    const thumbKey = await storage.put(thumb, 'image/webp', transaction);
    const photo = await RecordPhoto.create(
      {
        recordId,
        originRecordId: recordId,
        uploadedBy: user.id,
        blobKey,
        thumbKey,
        contentType,
        byteSize: file.buffer.length,
        width,
        height,
        sha256: createHash('sha256').update(file.buffer).digest('hex'),
        originalName: file.originalname?.slice(0, 200) ?? null,
        caption: null,
      },
      { transaction },
    );
    await addRevision(recordId, user.id, 'photo-add', [{ field: 'photos', from: null, to: photo.id }], transaction);
    return photo;
  });
}

/** Marks a photo removed (the record's author, the uploader, a curator or an admin); its bytes stay stored. */
export async function removePhoto(photoId: number, user: SessionUser): Promise<void> {
  const photo = await RecordPhoto.findByPk(photoId);
  if (!photo || photo.removedAt) throw new NotFoundError('Photo');
  const record = await ConditionRecord.findByPk(photo.recordId, { rejectOnEmpty: true });
  const allowed =
    canEditRecord(user, record) ||
    (user.id === photo.uploadedBy && user.role !== 'viewer') ||
    roleAtLeast(user.role, 'curator');
  if (!allowed)
    throw new ForbiddenError('Only the record’s author, the uploader, a curator or an admin may remove this photo.');
  await sequelize.transaction(async (transaction) => {
    await photo.update({ removedAt: new Date(), removedBy: user.id }, { transaction });
    await addRevision(record.id, user.id, 'photo-remove', [{ field: 'photos', from: photo.id, to: null }], transaction);
  });
}

/** The bytes of a photo or its thumbnail, with an ETag from their digest; 404 when removed or missing. */
export async function readPhoto(photoId: number, size: 'full' | 'thumb') {
  const photo = await RecordPhoto.findByPk(photoId);
  if (!photo || photo.removedAt) throw new NotFoundError('Photo');
  const key = size === 'thumb' ? photo.thumbKey : photo.blobKey;
  const stored = await blobStorage().get(key);
  if (!stored) throw new NotFoundError('Photo bytes');
  return { bytes: stored.bytes, contentType: stored.contentType, etag: `"${key}"` };
}
