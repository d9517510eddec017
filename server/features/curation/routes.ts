import { Router } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import {
  dismissInputSchema,
  mergeHistoryQuerySchema,
  mergeIdParamSchema,
  mergeInputSchema,
  mergePreviewQuerySchema,
} from '../../../shared/schemas/curation';
import { dismissGroup, findDuplicateGroups } from './duplicates';
import { mergePreview } from './preview';
import { mergeRecords } from './merge';
import { unmergeRecords } from './unmerge';
import { mergeHistory } from './history';

/** Curation queue, merge and unmerge: curators and admins only. */
export const curationRouter = Router();

curationRouter.get(
  '/duplicates',
  allow('curator'),
  handle({}, async (_input, _req, res) => {
    res.set('Cache-Control', 'no-store').json(await findDuplicateGroups());
  }),
);

curationRouter.post(
  '/duplicates/dismiss',
  allow('curator'),
  handle({ body: dismissInputSchema }, async ({ body }, req, res) => {
    res.status(201).json(await dismissGroup(body, currentUser(req).id));
  }),
);

curationRouter.get(
  '/merge-preview',
  allow('curator'),
  handle({ query: mergePreviewQuerySchema }, async ({ query }, _req, res) => {
    res.set('Cache-Control', 'no-store').json(await mergePreview(query.ids));
  }),
);

curationRouter.post(
  '/merge',
  allow('curator'),
  handle({ body: mergeInputSchema }, async ({ body }, req, res) => {
    res.status(201).json(await mergeRecords(body, currentUser(req).id));
  }),
);

curationRouter.get(
  '/merges',
  allow('curator'),
  handle({ query: mergeHistoryQuerySchema }, async ({ query }, _req, res) => {
    res.set('Cache-Control', 'no-store').json({ items: await mergeHistory(query) });
  }),
);

curationRouter.post(
  '/unmerge/:mergeId',
  allow('curator'),
  handle({ params: mergeIdParamSchema }, async ({ params }, req, res) => {
    res.json(await unmergeRecords(params.mergeId, currentUser(req).id));
  }),
);
