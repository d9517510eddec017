import { afterAll, beforeAll, describe, it } from 'vitest';
import { createApp } from '../../server/app';
import { prepareFuzz, serveOnLoopback, type FuzzContext } from '../helpers/fuzz/context';
import { eluentCases, structureCases } from '../helpers/fuzz/families';
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

describe('hostile structures and eluents (fast-check; the 10,000-case run is `npm run bench:fuzz`)', () => {
  it('SMILES- and molfile-like text through parse, search, Scout and records: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(ctx, structureCases(ctx), 90);
  });

  it('eluent notation as typed, through records, the eluent translator and Scout: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(ctx, eluentCases(ctx), 50);
  });
});
