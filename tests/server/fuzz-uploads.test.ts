import { afterAll, beforeAll, describe, it } from 'vitest';
import { createApp } from '../../server/app';
import { prepareFuzz, serveOnLoopback, type FuzzContext } from '../helpers/fuzz/context';
import { csvCases, uploadCases } from '../helpers/fuzz/families';
import { expectNoServerErrors } from '../helpers/fuzz/property';

const { app, close } = createApp();
let ctx: FuzzContext;
let served: Awaited<ReturnType<typeof serveOnLoopback>>;

beforeAll(async () => {
  served = await serveOnLoopback(app);
  ctx = await prepareFuzz(app, served.base);
});
afterAll(async () => {
  await served?.stop();
  await close();
});

describe('hostile files (fast-check; the 10,000-case run is `npm run bench:fuzz`)', () => {
  it('CSV-like files with odd delimiters, quotes, BOMs and huge fields, previewed and imported: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(ctx, csvCases(), 40);
  });

  it('photos and imports of the wrong type, size or field, with path-like and NUL-bearing names: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(ctx, uploadCases(ctx), 30);
  });
});
