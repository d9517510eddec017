// Dependency-free helpers that find, install and run Debian's PostgreSQL for Rfolio.
// Used by start.mjs and test.mjs before any npm package is known to be installed.
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash, randomBytes } from 'node:crypto';
import {
  existsSync,
  mkdirSync,
  readdirSync,
  chownSync,
  chmodSync,
  readFileSync,
  writeFileSync,
  renameSync,
  rmSync,
} from 'node:fs';
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
      "Rfolio needs PostgreSQL server binaries (initdb, pg_ctl). Install Debian's package first:\n" +
        '  sudo apt-get update && sudo apt-get install -y postgresql\n' +
        'or set RFOLIO_PG_BIN to the folder holding pg_ctl.',
    );
    process.exit(1);
  }
  log("PostgreSQL server not found: installing Debian's postgresql package (apt-get)…");
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

function postgresIds() {
  return {
    uid: Number(execFileSync('id', ['-u', 'postgres']).toString().trim()),
    gid: Number(execFileSync('id', ['-g', 'postgres']).toString().trim()),
  };
}

function ensureOwnedDir(dir) {
  mkdirSync(dir, { recursive: true });
  if (isRoot) {
    const { uid, gid } = postgresIds();
    chownSync(dir, uid, gid);
  }
  chmodSync(dir, 0o700);
}

/** A file only the cluster's owner may read (mode 0600, owned by postgres when we are root). */
function writeOwnerOnly(file, text) {
  writeFileSync(file, text, { mode: 0o600 });
  chmodSync(file, 0o600);
  if (isRoot) {
    const { uid, gid } = postgresIds();
    chownSync(file, uid, gid);
  }
}

/** Where the generated password of the cluster's `rfolio` role is kept: inside its data folder, mode 0600. */
export function passwordFile(paths) {
  return join(paths.data, 'rfolio.password');
}

/** Passwords of the clusters this process started or found, by port, for databaseUrl() and psql. */
const passwords = new Map();

/** The password of the project's cluster on this port (after startCluster), or undefined. */
export function clusterPassword(port) {
  return passwords.get(Number(port));
}

/** Who started a running cluster: `{ pid }` of the bootstrap process (npm start / npm test / a bench). */
function starterFile(paths) {
  return join(paths.base, 'started-by.json');
}

function processAlive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return err.code === 'EPERM';
  }
}

/** The pid recorded as the cluster's starter, when that process is gone (it crashed or was killed). */
function orphanedBy(paths) {
  try {
    const { pid } = JSON.parse(readFileSync(starterFile(paths), 'utf8'));
    return Number.isInteger(pid) && pid !== process.pid && !processAlive(pid) ? pid : null;
  } catch {
    return null;
  }
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
    // A generated password for the `rfolio` role, required (scram-sha-256) on TCP and on the socket.
    const password = randomBytes(24).toString('base64url');
    const pending = join(paths.base, 'rfolio.password.new');
    writeOwnerOnly(pending, `${password}\n`);
    pgExec(
      bin,
      'initdb',
      [
        '-D',
        paths.data,
        '-U',
        'rfolio',
        `--pwfile=${pending}`,
        '--auth-host=scram-sha-256',
        '--auth-local=scram-sha-256',
        '-E',
        'UTF8',
        '--no-locale',
      ],
      {
        stdio: 'ignore',
      },
    );
    renameSync(pending, passwordFile(paths));
  }
  let startedByUs = false;
  if (isRunning(bin, paths)) {
    // Left running by a start that crashed: take it back, so this run stops it when it ends.
    const orphan = orphanedBy(paths);
    if (orphan !== null) {
      log(`PostgreSQL in ${paths.data} was left running by process ${orphan}, which is gone: taking it back.`);
      writeFileSync(starterFile(paths), JSON.stringify({ pid: process.pid }));
      startedByUs = true;
    }
  } else {
    const opts = [`-c listen_addresses=127.0.0.1`, `-p ${port}`, `-k ${paths.socket}`, '-c max_connections=200'];
    if (fast) opts.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off');
    pgExec(bin, 'pg_ctl', ['-D', paths.data, '-l', paths.log, '-w', '-t', '60', '-o', opts.join(' '), 'start'], {
      stdio: 'ignore',
    });
    writeFileSync(starterFile(paths), JSON.stringify({ pid: process.pid }));
    startedByUs = true;
  }
  if (!existsSync(passwordFile(paths))) requirePassword(bin, paths, port, log);
  passwords.set(Number(port), readFileSync(passwordFile(paths), 'utf8').trim());
  return { startedByUs };
}

/**
 * A cluster created before passwords (initdb --auth=trust): gives the `rfolio` role a generated password,
 * keeps it in the data folder and switches every trust line of pg_hba.conf to scram-sha-256, then reloads.
 */
function requirePassword(bin, paths, port, log) {
  log(`PostgreSQL in ${paths.data} accepted anyone (trust): setting a generated password and requiring it.`);
  const password = randomBytes(24).toString('base64url');
  execFileSync(
    join(bin, 'psql'),
    ['-h', '127.0.0.1', '-p', String(port), '-U', 'rfolio', '-d', 'postgres', '-v', 'ON_ERROR_STOP=1', '-qtA'],
    {
      input: `SET password_encryption = 'scram-sha-256';\nALTER ROLE rfolio PASSWORD '${password}';\n`,
      stdio: ['pipe', 'ignore', 'inherit'],
    },
  );
  writeOwnerOnly(passwordFile(paths), `${password}\n`);
  const hba = join(paths.data, 'pg_hba.conf');
  const lines = readFileSync(hba, 'utf8').split('\n');
  writeFileSync(
    hba,
    lines.map((line) => (/^\s*#/.test(line) ? line : line.replace(/\btrust\s*$/, 'scram-sha-256'))).join('\n'),
  );
  pgExec(bin, 'pg_ctl', ['-D', paths.data, 'reload'], { stdio: 'ignore' });
}

export function stopCluster(bin, paths) {
  if (!isRunning(bin, paths)) return;
  pgExec(bin, 'pg_ctl', ['-D', paths.data, '-m', 'fast', '-w', 'stop'], { stdio: 'ignore' });
  rmSync(starterFile(paths), { force: true });
}

function psql(bin, port, db, sql) {
  return execFileSync(
    join(bin, 'psql'),
    ['-h', '127.0.0.1', '-p', String(port), '-U', 'rfolio', '-d', db, '-tAc', sql],
    {
      encoding: 'utf8',
      env: { ...process.env, PGPASSWORD: clusterPassword(port) ?? '' },
    },
  ).trim();
}

export function ensureDatabase(bin, port, db, { recreate = false } = {}) {
  if (recreate) psql(bin, port, 'postgres', `DROP DATABASE IF EXISTS "${db}" WITH (FORCE)`);
  const exists = psql(bin, port, 'postgres', `SELECT 1 FROM pg_database WHERE datname='${db}'`) === '1';
  if (!exists) psql(bin, port, 'postgres', `CREATE DATABASE "${db}"`);
  return !exists;
}

/** The URL of a database in the project's cluster on this port, with the cluster's password (after startCluster). */
export function databaseUrl(port, db) {
  const password = clusterPassword(port);
  return `postgres://rfolio${password ? `:${password}` : ''}@127.0.0.1:${port}/${db}`;
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
    return (
      psql(bin, port, 'postgres', "SELECT count(*) FROM pg_database WHERE datname LIKE 'rfolio\\_test\\_%'") !== '0'
    );
  } catch {
    return false;
  }
}
