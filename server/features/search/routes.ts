import { createHash } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import { Router } from 'express';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { searchQuerySchema } from '../../../shared/schemas/search';
import { search } from './service';
import { searchContributors } from './contributors';
import { requestContentStamp } from '../../db/data-stamp';
import { responseCache } from '../../http/read-cache';

export const searchRouter = Router();

/** Text, similarity and substructure search over active records, with the shared filters; see features/search. */
/**
 * Answers are the same for every reader, so they are kept per content stamp (db/data-stamp.ts): any content write
 * makes the next search compute afresh. `tookMs` (last in the answer) is this request's time on the server.
 */
searchRouter.get(
  '/',
  allow('viewer'),
  handle({ query: searchQuerySchema }, async ({ query }, req, res) => {
    const started = performance.now();
    const stamp = await requestContentStamp(req);
    const kept = await responseCache.get(`search:${JSON.stringify(query)}`, stamp, async () => {
      const { tookMs: _tookMs, ...answer } = await search(query);
      const bytes = Buffer.from(JSON.stringify(answer).slice(0, -1));
      return { bytes, etag: `W/"${createHash('sha1').update(bytes).digest('base64url')}"` };
    });
    const tookMs = Math.round((performance.now() - started) * 10) / 10;
    res
      .set('ETag', kept.etag)
      .type('application/json')
      .send(Buffer.concat([kept.bytes, Buffer.from(`,"tookMs":${tookMs}}`)]));
  }),
);

/** The people the contributor filter offers. */
searchRouter.get(
  '/contributors',
  allow('viewer'),
  handle({}, async (_input, _req, res) => {
    res.json(await searchContributors());
  }),
);
