import { Router } from 'express';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { scoutInputSchema } from '../../../shared/schemas/scout';
import { runScout } from './service';
import { requestContentStamp } from '../../db/data-stamp';
import { jsonBody, responseCache, sendJsonBody } from '../../http/read-cache';

export const scoutRouter = Router();

/**
 * Starting conditions for a structure from the recorded neighbours, with the evidence for every number. The
 * answer is the same for every reader, so it is kept per content stamp (db/data-stamp.ts): never stale after a content write.
 */
scoutRouter.post(
  '/',
  allow('viewer'),
  handle({ body: scoutInputSchema }, async ({ body }, req, res) => {
    const stamp = await requestContentStamp(req);
    sendJsonBody(
      res,
      await responseCache.get(`scout:${JSON.stringify(body)}`, stamp, async () =>
        jsonBody(await runScout(body, stamp)),
      ),
    );
  }),
);
