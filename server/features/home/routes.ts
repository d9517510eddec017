import { Router } from 'express';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { overview } from './overview';

/** The home page's counts of the base, this month and before. */
export const overviewRouter = Router();

overviewRouter.get(
  '/',
  allow('viewer'),
  handle({}, async (_input, _req, res) => {
    res.json(await overview());
  }),
);
