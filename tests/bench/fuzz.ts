/**
 * Hostile-input run (`npm run bench:fuzz [-- --cases 10000 --seed 42]`): the fast-check families of
 * tests/helpers/fuzz (SMILES- and molfile-like text, eluent notation, CSV files, wrong-type and oversize uploads,
 * path-like file names, wrong-shaped JSON for every POST/PATCH route, raw bodies, hostile paths and queries)
 * against the app on 127.0.0.1, signed in as an admin with CSRF, over the invented demo group. Uses
 * DATABASE_URL when set, otherwise a throwaway database in the benchmarks' own cluster.
 * Prints counts per endpoint, the first offending inputs, and last
 * `cases=<n> server_errors=<n> unexplained_refusals=<n>`. Replay a run with the same --seed.
 */
import type { AddressInfo } from 'node:net';
import fc from 'fast-check';
import { throwawayDatabase } from './bench-database';

const option = (name: string, fallback: number) => {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? Number(process.argv[at + 1]) : fallback;
};
const CASES = option('cases', 10_000);
const SEED = option('seed', Date.now() % 1_000_000);

const database = process.env.DATABASE_URL ? null : throwawayDatabase('fuzz');
process.env.DATABASE_URL ??= database!.url;
process.env.NODE_ENV = 'test';
process.env.LOG_LEVEL ??= 'silent';

const { createApp } = await import('../../server/http/app');
const { createHttpServer } = await import('../../server/http/http-server');
const { seedDemoOnce } = await import('../../seeders');
const { sequelize } = await import('../../server/db/sequelize');
const { prepareFuzz } = await import('../helpers/fuzz/context');
const { fuzzFamilies } = await import('../helpers/fuzz/families');
const { answerOf } = await import('../helpers/fuzz/cases');
const { FuzzTally } = await import('../helpers/fuzz/verdict');

const { app, close } = createApp();
const server = createHttpServer(app);
try {
  await seedDemoOnce();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const ctx = await prepareFuzz(app, base);
  const families = Object.entries(fuzzFamilies(ctx));
  const totalWeight = families.reduce((sum, [, family]) => sum + family.weight, 0);
  const tally = new FuzzTally();
  const started = performance.now();
  console.log(`fuzzing ${base} with ${CASES} cases, seed ${SEED}`);
  for (const [index, [name, family]] of families.entries()) {
    const runs =
      index === families.length - 1 ? CASES - tally.total() : Math.round((CASES * family.weight) / totalWeight);
    const cases = fc.sample(family.cases, { numRuns: runs, seed: SEED + index });
    for (const fuzzCase of cases) {
      const answer = await fuzzCase
        .send(ctx.agent)
        .then(answerOf, (error: Error) => ({ status: 599, body: { socket: error.message }, type: 'none' }));
      tally.add(fuzzCase.endpoint, fuzzCase.input, answer);
    }
    console.log(
      `${name}: ${runs} cases done (${tally.total()} in ${((performance.now() - started) / 1000).toFixed(0)} s)`,
    );
  }

  console.log(
    `\n${'endpoint'.padEnd(44)} ${'cases'.padStart(6)} ${'2xx/3xx'.padStart(8)} ${'4xx ok'.padStart(7)} ` +
      `${'5xx'.padStart(5)} ${'4xx ?'.padStart(6)}`,
  );
  for (const [endpoint, counts] of [...tally.byEndpoint].sort(([a], [b]) => a.localeCompare(b))) {
    const total = counts.accepted + counts.refused + counts.server_error + counts.unexplained_refusal;
    console.log(
      `${endpoint.padEnd(44)} ${String(total).padStart(6)} ${String(counts.accepted).padStart(8)} ` +
        `${String(counts.refused).padStart(7)} ${String(counts.server_error).padStart(5)} ` +
        `${String(counts.unexplained_refusal).padStart(6)}`,
    );
  }
  for (const offence of tally.offences.slice(0, 20)) {
    console.log(
      `\n${offence.verdict} ${offence.status} ${offence.endpoint}\n  input: ${JSON.stringify(offence.input)}\n  why:   ${offence.why}`,
    );
  }
  console.log(`\nseed=${SEED} duration_s=${((performance.now() - started) / 1000).toFixed(0)}`);
  console.log(
    `cases=${tally.total()} server_errors=${tally.total('server_error')} unexplained_refusals=${tally.total('unexplained_refusal')}`,
  );
} finally {
  server.close();
  await close();
  await sequelize.close();
  database?.cleanup();
}
process.exit(0);
