import { UnprocessableError } from '../../http/errors';
import { logger } from '../../http/logger';
import { sniffPhoto } from '../../storage/photo-sniff';
import { readPlates, type ReadOutcome } from './reader';

/**
 * Reads a plate photo: the same sniffing as record photos (415 unless JPEG, PNG or WebP by content), then the
 * reader. Pixels that do not decode (a truncated file) are 422; so is a reading that fails inside the analysis
 * (logged, as that is a fault of ours) — the chemist can still mark the plate by hand.
 */
export async function readPhotoPlates(bytes: Buffer): Promise<ReadOutcome> {
  const { contentType } = await sniffPhoto(bytes);
  try {
    return await readPlates(bytes);
  } catch (error) {
    const undecodable =
      error instanceof Error && /vips|decode|corrupt|premature|truncat|marker|input/i.test(error.message);
    if (!undecodable) logger.error({ err: error }, 'plate reading failed');
    throw new UnprocessableError(
      undecodable
        ? `The file starts like ${contentType} but its image data cannot be decoded (truncated or damaged); upload the photo again.`
        : 'The photo could not be read automatically; mark the plate by hand on the photo.',
      { missing: 'reading' },
    );
  }
}
