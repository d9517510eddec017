import { Router } from 'express';
import multer from 'multer';
import { allow, currentUser } from '../../http/middleware/access';
import { readableMultipart } from '../../http/middleware/multipart';
import { handle } from '../../http/middleware/validate';
import { BadRequestError, UnprocessableError } from '../../http/errors';
import { MAX_PHOTO_BYTES } from '../../storage/photo-sniff';
import { readPhotoPlates } from './service';
import { annotationHistory, currentAnnotation, saveAnnotation } from './annotations';
import { idParamSchema } from '../../../shared/schemas/common';
import { plateAnnotationSchema } from '../../../shared/schemas/plates';

export const platesRouter = Router();

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1 } });

/** Reads the plates, lanes and spots of a plate photo (multipart field `photo`); nothing is stored. */
platesRouter.post(
  '/read',
  allow('member'),
  readableMultipart(upload.single('photo')),
  handle({}, async (_input, req, res) => {
    if (!req.file) throw new BadRequestError('Attach the plate photo as multipart field "photo".');
    const outcome = await readPhotoPlates(req.file.buffer);
    if (!outcome.ok)
      throw new UnprocessableError(outcome.message, {
        missing: outcome.missing,
        width: outcome.width,
        height: outcome.height,
      });
    res.json(outcome.reading);
  }),
);

/** A record photo's plate annotation (the overlay editor's work), its revisions, and saving a new revision. */
platesRouter.get(
  '/photos/:id/annotation',
  allow('viewer'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    res.json(await currentAnnotation(params.id));
  }),
);

platesRouter.get(
  '/photos/:id/annotation/revisions',
  allow('viewer'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    res.json({ items: await annotationHistory(params.id) });
  }),
);

platesRouter.put(
  '/photos/:id/annotation',
  allow('member'),
  handle({ params: idParamSchema, body: plateAnnotationSchema }, async ({ params, body }, req, res) => {
    res.json(await saveAnnotation(params.id, body, currentUser(req)));
  }),
);
