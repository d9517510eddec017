// A throwaway PostgreSQL database for a benchmark, in a cluster of the benchmarks' own (never the test
// cluster, which fault tests stop, nor the demo's), started with the project's bootstrap helpers.
import { execFileSync, spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { dirname, join, resolve } from 'node:path';
import {
  clusterPassword,
  clusterPaths,
  databaseUrl,
  dropDatabase,
  ensureDatabase,
  ensurePostgresInstalled,
  startCluster,
  stopCluster,
} from '../../server/bootstrap/postgres.mjs';

export const projectRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');

export interface BenchDatabase {
  url: string;
  /** Drops the database, and stops the cluster when this run started it and no other benchmark uses it. */
  cleanup: () => void;
}

/** Creates `rfolio_bench_<name>_<pid>` (migrated) on 127.0.0.1 in the `bench` cluster (RFOLIO_BENCH_PG_PORT, default 54360). */
export function throwawayDatabase(name: string): BenchDatabase {
  const bin = ensurePostgresInstalled();
  const port = Number(process.env.RFOLIO_BENCH_PG_PORT ?? 54360);
  const paths = clusterPaths(projectRoot, 'bench');
  const { startedByUs } = startCluster(bin, paths, port, { fast: true });
  const db = `rfolio_bench_${name}_${process.pid}`;
  ensureDatabase(bin, port, db, { recreate: true });
  const url = databaseUrl(port, db);
  const migrated = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/migrate.ts'], {
    cwd: projectRoot,
    env: { ...process.env, DATABASE_URL: url, LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  if (migrated.status !== 0) throw new Error(`migrating ${db} failed`);
  const othersActive = () => {
    const sql = `SELECT count(*) FROM pg_database WHERE datname LIKE 'rfolio\\_bench\\_%'`;
    const args = ['-h', '127.0.0.1', '-p', String(port), '-U', 'rfolio', '-d', 'postgres', '-tAc', sql];
    try {
      const env = { ...process.env, PGPASSWORD: clusterPassword(port) ?? '' };
      return execFileSync(join(bin, 'psql'), args, { encoding: 'utf8', env }).trim() !== '0';
    } catch {
      return false;
    }
  };
  return {
    url,
    cleanup: () => {
      dropDatabase(bin, port, db);
      if (startedByUs && !othersActive()) stopCluster(bin, paths);
    },
  };
}
