// Measures how long the demo seeding takes on a fresh database and prints the numbers.
// Run: `node --import tsx tests/bench/seed-demo.ts` (starts the project's own PostgreSQL cluster on a
// spare port, seeds a throwaway database, prints the time and the counts, drops the database).
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import {
  clusterPaths,
  databaseUrl,
  dropDatabase,
  ensureDatabase,
  ensurePostgresInstalled,
  startCluster,
  stopCluster,
} from '../../server/bootstrap/postgres.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const bin = ensurePostgresInstalled();
const port = Number(process.env.RFOLIO_BENCH_PG_PORT ?? 54349);
const paths = clusterPaths(root, 'bench');
const { startedByUs } = startCluster(bin, paths, port, { fast: true });
const db = 'rfolio_bench_seed';
ensureDatabase(bin, port, db, { recreate: true });
process.env.DATABASE_URL = databaseUrl(port, db);
process.env.LOG_LEVEL ??= 'silent';

try {
  const { migrator } = await import('../../server/db/migrator');
  const { sequelize } = await import('../../server/db/sequelize');
  const { seedDemoOnce } = await import('../../seeders');
  const { closeFingerprintPool } = await import('../../server/chem');
  await migrator.up();
  const started = performance.now();
  await seedDemoOnce();
  const seconds = (performance.now() - started) / 1000;
  const [[counts]] = (await sequelize.query(`SELECT
    (SELECT count(*) FROM condition_records WHERE demo) AS records,
    (SELECT count(DISTINCT compound_id) FROM condition_records WHERE demo) AS compounds,
    (SELECT count(DISTINCT cls) FROM compounds, unnest(classes) AS cls) AS classes,
    (SELECT count(*) FROM compounds WHERE fingerprint IS NOT NULL) AS fingerprints`)) as [
    Record<string, string>[],
    unknown,
  ];
  console.log(
    `demo seed: ${seconds.toFixed(2)} s; ${counts.records} records over ${counts.compounds} compounds, ` +
      `${counts.classes} classes, ${counts.fingerprints} fingerprints`,
  );
  await closeFingerprintPool();
  await sequelize.close();
} finally {
  dropDatabase(bin, port, db);
  if (startedByUs) stopCluster(bin, paths);
}
