import { Router } from 'express';
import { allow } from './middleware/access';
import { databaseIsUp } from '../db/sequelize';
import { appVersion } from './version';
import type { Health } from '../../shared/schemas/common';

export const healthRouter = Router();

healthRouter.get('/', allow('public'), async (_req, res) => {
  const up = await databaseIsUp();
  const body: Health = { status: up ? 'ok' : 'degraded', db: up ? 'up' : 'down', version: appVersion };
  res
    .status(up ? 200 : 503)
    .set('Cache-Control', 'no-store')
    .json(body);
});
