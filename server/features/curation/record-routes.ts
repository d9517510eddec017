import { Router } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { idParamSchema } from '../../../shared/schemas/common';
import { retireInputSchema } from '../../../shared/schemas/curation';
import { restore, retire } from './retire';

/**
 * Retire and restore, under /api/records. Declared for members because a member may retire their own
 * record (and restore it if they retired it); every other case needs a curator (checked in the service).
 */
export const recordCurationRouter = Router();

recordCurationRouter.post(
  '/:id/retire',
  allow('member'),
  handle({ params: idParamSchema, body: retireInputSchema }, async ({ params, body }, req, res) => {
    res.json(await retire(params.id, body.reason, currentUser(req)));
  }),
);

recordCurationRouter.post(
  '/:id/restore',
  allow('member'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    res.json(await restore(params.id, currentUser(req)));
  }),
);
