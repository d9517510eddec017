import { afterAll, beforeAll, describe, it } from 'vitest';
import { createApp } from '../../server/app';
import { prepareFuzz, serveOnLoopback, type FuzzContext } from '../helpers/fuzz/context';
import { bodyCases, pathCases, rawCases } from '../helpers/fuzz/families';
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

describe('hostile requests to every route of the route table (fast-check; the 10,000-case run is `npm run bench:fuzz`)', () => {
  it('JSON bodies of the wrong shape for every POST and PATCH route: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(ctx, bodyCases(ctx), 90);
  });

  it('bodies that are not JSON, or too large or too deep, for every write route: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(ctx, rawCases(ctx), 25);
  });

  it('hostile path parameters and query strings on GET routes: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(ctx, pathCases(ctx), 45);
  });
});
