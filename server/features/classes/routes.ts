import { Router } from 'express';
import { z } from 'zod';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { classDetail, classIndex } from './service';

/** Compound classes (shared/catalogue/compound-classes.ts) with what the group's records say about them. */
export const classesRouter = Router();

classesRouter.get('/', allow('viewer'), handle({}, async (_input, _req, res) => {
  res.json(await classIndex());
}));

classesRouter.get('/:key', allow('viewer'), handle({ params: z.object({ key: z.string().trim().min(1).max(60) }) }, async ({ params }, _req, res) => {
  res.json(await classDetail(params.key));
}));
