import { Router } from 'express';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { columnPlanInputSchema, translateEluentInputSchema } from '../../../shared/schemas/tools';
import { columnPlanFor, translateFor } from './service';

export const toolsRouter = Router();

/** Flash-column plan from sample mass and TLC Rf values (Still, Kahn & Mitra 1978). */
toolsRouter.post(
  '/column-plan',
  allow('viewer'),
  handle({ body: columnPlanInputSchema }, ({ body }, _req, res) => {
    res.json(columnPlanFor(body));
  }),
);

/** Equal-strength mixture of another solvent pair (Snyder), with hazards of both sides. */
toolsRouter.post(
  '/translate-eluent',
  allow('viewer'),
  handle({ body: translateEluentInputSchema }, ({ body }, _req, res) => {
    res.json(translateFor(body));
  }),
);
