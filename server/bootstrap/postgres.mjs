// Dependency-free helpers that find, install and run Debian's PostgreSQL for Rfolio.
// Used by start.mjs and test.mjs before any npm package is known to be installed.
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, chownSync, chmodSync } from 'node:fs';
import { join, resolve } from 'node:path';

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

function findBinDir() {
  if (process.env.RFOLIO_PG_BIN && existsSync(join(process.env.RFOLIO_PG_BIN, 'pg_ctl'))) {
    return process.env.RFOLIO_PG_BIN;
  }
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) return null;
  const versions = readdirSync(root)
    .filter((v) => existsSync(join(root, v, 'bin', 'pg_ctl')) && existsSync(join(root, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? join(root, versions[0], 'bin') : null;
}

/** Returns the folder of PostgreSQL's server binaries, installing Debian's package as root when missing. */
export function ensurePostgresInstalled(log = console.log) {
  let bin = findBinDir();
  if (bin) return bin;
  if (!isRoot) {
    console.error(
      'Rfolio needs PostgreSQL server binaries (initdb, pg_ctl). Install Debian\'s package first:\n' +
        '  sudo apt-get update && sudo apt-get install -y postgresql\n' +
        'or set RFOLIO_PG_BIN to the folder holding pg_ctl.',
    );
    process.exit(1);
  }
  log('PostgreSQL server not found: installing Debian\'s postgresql package (apt-get)…');
  run('apt-get', ['update'], { env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  run('apt-get', ['install', '-y', '--no-install-recommends', 'postgresql'], {
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
  bin = findBinDir();
  if (!bin) {
    console.error('apt-get finished but no PostgreSQL server binaries were found under /usr/lib/postgresql.');
    process.exit(1);
  }
  return bin;
}

function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', ...opts });
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} failed with exit code ${r.status}`);
}

/** Runs a PostgreSQL binary as the cluster owner (postgres when we are root, ourselves otherwise). */
function pgExec(bin, tool, args, opts = {}) {
  const exe = join(bin, tool);
  if (isRoot) return execFileSync('runuser', ['-u', 'postgres', '--', exe, ...args], opts);
  return execFileSync(exe, args, opts);
}

export function clusterPaths(projectDir, name) {
  const base = process.env.RFOLIO_PGDATA_ROOT
    ? resolve(process.env.RFOLIO_PGDATA_ROOT, name)
    : isRoot
      ? `/var/lib/rfolio/${createHash('sha256').update(resolve(projectDir)).digest('hex').slice(0, 12)}-${name}`
      : join(projectDir, '.data', name);
  return { base, data: join(base, 'data'), socket: join(base, 'run'), log: join(base, 'server.log') };
}

function ensureOwnedDir(dir) {
  mkdirSync(dir, { recursive: true });
  if (isRoot) {
    const uid = Number(execFileSync('id', ['-u', 'postgres']).toString().trim());
    const gid = Number(execFileSync('id', ['-g', 'postgres']).toString().trim());
    chownSync(dir, uid, gid);
  }
  chmodSync(dir, 0o700);
}

export function isRunning(bin, paths) {
  if (!existsSync(join(paths.data, 'PG_VERSION'))) return false;
  try {
    pgExec(bin, 'pg_ctl', ['-D', paths.data, 'status'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

/**
 * Creates (first time) and starts a cluster of Rfolio's own on 127.0.0.1:port.
 * Returns { startedByUs } so the caller stops only what it started.
 */
export function startCluster(bin, paths, port, { fast = false, log = console.log } = {}) {
  if (isRoot) {
    ensureOwnedDir(paths.base.split('/').slice(0, -1).join('/') || '/');
    chmodSync(paths.base.split('/').slice(0, -1).join('/'), 0o755);
  }
  ensureOwnedDir(paths.base);
  ensureOwnedDir(paths.socket);
  if (!existsSync(join(paths.data, 'PG_VERSION'))) {
    log(`Creating PostgreSQL cluster in ${paths.data}`);
    ensureOwnedDir(paths.data);
    pgExec(bin, 'initdb', ['-D', paths.data, '-U', 'rfolio', '--auth=trust', '-E', 'UTF8', '--no-locale'], {
      stdio: 'ignore',
    });
  }
  if (isRunning(bin, paths)) return { startedByUs: false };
  const opts = [`-c listen_addresses=127.0.0.1`, `-p ${port}`, `-k ${paths.socket}`, '-c max_connections=200'];
  if (fast) opts.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off');
  pgExec(bin, 'pg_ctl', ['-D', paths.data, '-l', paths.log, '-w', '-t', '60', '-o', opts.join(' '), 'start'], {
    stdio: 'ignore',
  });
  return { startedByUs: true };
}

export function stopCluster(bin, paths) {
  if (!isRunning(bin, paths)) return;
  pgExec(bin, 'pg_ctl', ['-D', paths.data, '-m', 'fast', '-w', 'stop'], { stdio: 'ignore' });
}

function psql(bin, port, db, sql) {
  return execFileSync(join(bin, 'psql'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'rfolio', '-d', db, '-tAc', sql], {
    encoding: 'utf8',
  }).trim();
}

export function ensureDatabase(bin, port, db, { recreate = false } = {}) {
  if (recreate) psql(bin, port, 'postgres', `DROP DATABASE IF EXISTS "${db}" WITH (FORCE)`);
  const exists = psql(bin, port, 'postgres', `SELECT 1 FROM pg_database WHERE datname='${db}'`) === '1';
  if (!exists) psql(bin, port, 'postgres', `CREATE DATABASE "${db}"`);
  return !exists;
}

export function databaseUrl(port, db) {
  return `postgres://rfolio@127.0.0.1:${port}/${db}`;
}

export function dropDatabase(bin, port, db) {
  try {
    psql(bin, port, 'postgres', `DROP DATABASE IF EXISTS "${db}" WITH (FORCE)`);
  } catch {
    /* the cluster may already be gone */
  }
}

/** True when another test run's databases exist, so the cluster must stay up for it. */
export function otherRunsActive(bin, port) {
  try {
    return psql(bin, port, 'postgres', "SELECT count(*) FROM pg_database WHERE datname LIKE 'rfolio\\_test\\_%'") !== '0';
  } catch {
    return false;
  }
}
