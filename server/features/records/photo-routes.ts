import { Router } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { idParamSchema } from '../../../shared/schemas/common';
import { photoSizeQuerySchema } from '../../../shared/schemas/record';
import { readPhoto, removePhoto } from './photos';

export const photosRouter = Router();

/** Photo bytes are immutable under their id (content-addressed), so clients may cache them for a day and revalidate by ETag. */
photosRouter.get(
  '/:id',
  allow('viewer'),
  handle({ params: idParamSchema, query: photoSizeQuerySchema }, async ({ params, query }, req, res) => {
    const photo = await readPhoto(params.id, query.size);
    res.set({ ETag: photo.etag, 'Cache-Control': 'private, max-age=86400', 'X-Content-Type-Options': 'nosniff' });
    if (req.headers['if-none-match'] === photo.etag) {
      res.status(304).end();
      return;
    }
    res.type(photo.contentType).send(photo.bytes);
  }),
);

photosRouter.delete(
  '/:id',
  allow('member'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    await removePhoto(params.id, currentUser(req));
    res.status(204).end();
  }),
);
