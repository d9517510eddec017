import sharp, { type Metadata } from 'sharp';
import { UnsupportedMediaTypeError } from '../http/errors';
import type { PhotoContentType } from '../db/models/record-photo';

/** Largest accepted photo, bytes (10 MB); multer refuses anything larger with 413. */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;

const accepted: Record<string, PhotoContentType> = { jpeg: 'image/jpeg', png: 'image/png', webp: 'image/webp' };

/**
 * Decodes a photo's header with sharp: the content decides the type, never the file name or declared type. Answers
 * the type and the size as displayed (EXIF orientation applied); 415 for anything but a JPEG, PNG or WebP image.
 */
export async function sniffPhoto(
  bytes: Buffer,
): Promise<{ contentType: PhotoContentType; width: number; height: number }> {
  let metadata: Metadata;
  try {
    metadata = await sharp(bytes).metadata();
  } catch {
    throw new UnsupportedMediaTypeError('The file is not a readable image; plate photos must be JPEG, PNG or WebP.');
  }
  const contentType = metadata.format ? accepted[metadata.format] : undefined;
  if (!contentType || !metadata.width || !metadata.height) {
    throw new UnsupportedMediaTypeError(
      `The file is ${metadata.format ?? 'of an unknown type'}; plate photos must be JPEG, PNG or WebP.`,
    );
  }
  const turned = (metadata.orientation ?? 1) >= 5;
  return {
    contentType,
    width: turned ? metadata.height : metadata.width,
    height: turned ? metadata.width : metadata.height,
  };
}
