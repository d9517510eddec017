// `npm start` / `npm run dev`: everything from a fresh clone to a served app, with no npm package assumed.
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { dirname, join, resolve } from 'node:path';
import { ensureNodeModules, ensureClientBuild } from './deps.mjs';
import {
  ensurePostgresInstalled,
  clusterPaths,
  startCluster,
  stopCluster,
  ensureDatabase,
  databaseUrl,
} from './postgres.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const dev = process.argv.includes('--dev');
const production = process.env.NODE_ENV === 'production';

if (production && !process.env.SESSION_SECRET) {
  console.error('NODE_ENV=production needs SESSION_SECRET (a long random string). Refusing to start.');
  process.exit(1);
}

ensureNodeModules(root);
// With DATABASE_URL set (e.g. a managed PostgreSQL) the project's own cluster is neither installed nor started.
const ownCluster = !process.env.DATABASE_URL;
const bin = ownCluster ? ensurePostgresInstalled() : undefined;
const pgPort = Number(process.env.RFOLIO_PG_PORT ?? 54329);
const dbName = process.env.RFOLIO_DB ?? (production ? 'rfolio' : 'rfolio_demo');
const paths = clusterPaths(root, production ? 'prod' : 'demo');
const { startedByUs } = ownCluster ? startCluster(bin, paths, pgPort) : { startedByUs: false };
if (ownCluster) ensureDatabase(bin, pgPort, dbName);
if (!dev) ensureClientBuild(root);

const env = {
  ...process.env,
  DATABASE_URL: process.env.DATABASE_URL ?? databaseUrl(pgPort, dbName),
  // In dev the pages are served by Vite, so e-mailed links must point there.
  ...(dev && !process.env.APP_URL ? { APP_URL: 'http://127.0.0.1:5173' } : {}),
  ...(ownCluster ? { RFOLIO_PG_BIN: bin, RFOLIO_PGDATA: paths.data } : {}),
};

const tsx = join(root, 'node_modules', '.bin', 'tsx');
const children = dev
  ? [
      spawn(tsx, ['watch', '--clear-screen=false', 'server/index.ts'], { cwd: root, env, stdio: 'inherit' }),
      spawn(join(root, 'node_modules', '.bin', 'vite'), [], { cwd: root, env, stdio: 'inherit' }),
    ]
  : [spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { cwd: root, env, stdio: 'inherit' })];

let stopping = false;
function shutdown(code) {
  if (stopping) return;
  stopping = true;
  for (const child of children) if (child.exitCode === null) child.kill('SIGTERM');
  Promise.all(children.map((c) => (c.exitCode !== null ? null : new Promise((r) => c.once('exit', r))))).then(() => {
    if (startedByUs) {
      stopCluster(bin, paths);
      console.log('PostgreSQL stopped.');
    }
    process.exit(code);
  });
}
for (const sig of ['SIGINT', 'SIGTERM', 'SIGHUP']) process.on(sig, () => shutdown(0));
for (const child of children) child.on('exit', (code) => shutdown(code ?? 0));
