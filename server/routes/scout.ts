import { Router } from 'express';
import { allow } from '../middleware/access';
import { handle } from '../middleware/validate';
import { scoutInputSchema } from '../../shared/schemas/scout';
import { runScout } from '../services/scout';

export const scoutRouter = Router();

/** Starting conditions for a structure from the recorded neighbours, with the evidence for every number. */
scoutRouter.post('/', allow('viewer'), handle({ body: scoutInputSchema }, async ({ body }, _req, res) => {
  res.json(await runScout(body));
}));
