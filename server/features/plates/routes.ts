import { Router } from 'express';
import multer from 'multer';
import { allow } from '../../http/middleware/access';
import { readableMultipart } from '../../http/middleware/multipart';
import { handle } from '../../http/middleware/validate';
import { BadRequestError, UnprocessableError } from '../../http/errors';
import { MAX_PHOTO_BYTES } from '../../storage/photo-sniff';
import { readPhotoPlates } from './service';

export const platesRouter = Router();

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1 } });

/** Reads the plates, lanes and spots of a plate photo (multipart field `photo`); nothing is stored. */
platesRouter.post('/read', allow('member'), readableMultipart(upload.single('photo')), handle({}, async (_input, req, res) => {
  if (!req.file) throw new BadRequestError('Attach the plate photo as multipart field "photo".');
  const outcome = await readPhotoPlates(req.file.buffer);
  if (!outcome.ok) throw new UnprocessableError(outcome.message, { missing: outcome.missing, width: outcome.width, height: outcome.height });
  res.json(outcome.reading);
}));
