import { Router } from 'express';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { classKeyParamSchema } from '../../../shared/schemas/classes';
import { classDetail, classIndex } from './service';

/** Compound classes (shared/catalogue/compound-classes.ts) with what the group's records say about them. */
export const classesRouter = Router();

classesRouter.get(
  '/',
  allow('viewer'),
  handle({}, async (_input, _req, res) => {
    res.json(await classIndex());
  }),
);

classesRouter.get(
  '/:key',
  allow('viewer'),
  handle({ params: classKeyParamSchema }, async ({ params }, _req, res) => {
    res.json(await classDetail(params.key));
  }),
);
