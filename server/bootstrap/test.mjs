// `npm test`: the same bootstrap as `npm start`, with PostgreSQL databases of the tests' own, then every
// Vitest project. Extra arguments go to Vitest (e.g. `npm test -- --project server tests/server/x.test.ts`).
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { dirname, join, resolve } from 'node:path';
import { ensureNodeModules, ensureClientBuild, ensureChromium, sh } from './deps.mjs';
import {
  isRoot,
  ensurePostgresInstalled,
  clusterPaths,
  startCluster,
  stopCluster,
  ensureDatabase,
  databaseUrl,
  dropDatabase,
  otherRunsActive,
} from './postgres.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const args = process.argv.slice(2);
const wantsE2e = args.length === 0 || args.some((a) => a.includes('e2e'));

ensureNodeModules(root);
const bin = ensurePostgresInstalled();
const chromium = wantsE2e ? ensureChromium(isRoot) : undefined;
const pgPort = Number(process.env.RFOLIO_TEST_PG_PORT ?? 54339);
const paths = clusterPaths(root, 'test');
const { startedByUs } = startCluster(bin, paths, pgPort, { fast: true });

// Databases of this run only, so concurrent runs on one machine never share rows.
const testDb = `rfolio_test_${process.pid}`;
const e2eDb = `rfolio_e2e_${process.pid}`;
let status;
try {
  ensureDatabase(bin, pgPort, testDb, { recreate: true });
  ensureDatabase(bin, pgPort, e2eDb, { recreate: true });
  const env = {
    ...process.env,
    NODE_ENV: 'test',
    DATABASE_URL: databaseUrl(pgPort, testDb),
    E2E_DATABASE_URL: databaseUrl(pgPort, e2eDb),
    RFOLIO_PG_BIN: bin,
    RFOLIO_PGDATA: paths.data,
    RFOLIO_PG_PORT: String(pgPort),
    RFOLIO_PG_SOCKET: paths.socket,
    CHROMIUM_PATH: chromium ?? '',
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'silent',
  };
  sh(process.execPath, ['--import', 'tsx', 'server/cli/migrate.ts'], { cwd: root, env });
  const vitest = join(root, 'node_modules', '.bin', 'vitest');
  if (args.length > 0) {
    if (wantsE2e) ensureClientBuild(root);
    status = spawnSync(vitest, ['run', ...args], { cwd: root, env, stdio: 'inherit' }).status ?? 1;
  } else {
    // Static checks first: types, lint (including the feature-boundary rule), format and unused exports.
    const checks = ['typecheck', 'lint', 'format:check', 'deadcode'].map(
      (script) => spawnSync('npm', ['run', '--silent', script], { cwd: root, env, stdio: 'inherit' }).status,
    );
    // The fault tests stop PostgreSQL, so the browser journeys run after the other projects, not beside them.
    const unit = spawnSync(vitest, ['run', '--project', 'shared', '--project', 'client', '--project', 'server'], {
      cwd: root,
      env,
      stdio: 'inherit',
    }).status;
    ensureClientBuild(root);
    const e2e = spawnSync(vitest, ['run', '--project', 'e2e'], { cwd: root, env, stdio: 'inherit' }).status;
    status = unit === 0 && e2e === 0 && checks.every((code) => code === 0) ? 0 : 1;
  }
} finally {
  dropDatabase(bin, pgPort, testDb);
  dropDatabase(bin, pgPort, e2eDb);
  if (startedByUs && !otherRunsActive(bin, pgPort)) stopCluster(bin, paths);
}
process.exit(status);
