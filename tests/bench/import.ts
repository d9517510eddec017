// `npm run bench:import`: imports a generated 10,000-row history over 2,500 distinct compounds end to end
// (HTTP upload → parse → validate → compounds with fingerprints → records) and prints the time. Target:
// ≤ 30 s on a 2-core machine. Uses DATABASE_URL when set; otherwise starts a throwaway database in a
// PostgreSQL cluster of its own with the project's bootstrap helpers, and removes it afterwards.
import { createServer, type Server } from 'node:http';
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';
import {
  clusterPaths,
  databaseUrl,
  dropDatabase,
  ensureDatabase,
  ensurePostgresInstalled,
  startCluster,
  stopCluster,
} from '../../server/bootstrap/postgres.mjs';
import { distinctCompounds, historyCsv } from './import-history';

const ROWS = Number(process.env.BENCH_ROWS ?? 10_000);
const COMPOUNDS = Number(process.env.BENCH_COMPOUNDS ?? 2_500);
const root = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');

function throwawayDatabase(): { url: string; cleanup: () => void } {
  const bin = ensurePostgresInstalled();
  const port = Number(process.env.RFOLIO_BENCH_PG_PORT ?? 54358);
  const paths = clusterPaths(root, 'bench-import');
  const { startedByUs } = startCluster(bin, paths, port, { fast: true });
  const db = `rfolio_bench_import_${process.pid}`;
  ensureDatabase(bin, port, db, { recreate: true });
  return {
    url: databaseUrl(port, db),
    cleanup: () => {
      dropDatabase(bin, port, db);
      if (startedByUs) stopCluster(bin, paths);
    },
  };
}

const own = process.env.DATABASE_URL ? null : throwawayDatabase();
process.env.DATABASE_URL ??= own?.url;
process.env.LOG_LEVEL ??= 'warn';

async function main() {
  const { migrator } = await import('../../server/db/migrator');
  const { sequelize } = await import('../../server/db/sequelize');
  const { createApp } = await import('../../server/http/app');
  const { User } = await import('../../server/db/models');
  const { hashPassword } = await import('../../server/auth/passwords');
  await migrator.up();

  console.log(`Generating ${ROWS} rows over ${COMPOUNDS} distinct compounds…`);
  const csv = historyCsv(distinctCompounds(COMPOUNDS), ROWS);
  const email = `bench-curator-${process.pid}@bench.invalid`;
  const password = 'bench-password-long-enough';
  await User.create({ email, name: 'Bench curator', role: 'curator', passwordHash: await hashPassword(password) });

  const { app, close } = createApp();
  const server: Server = createServer(app);
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  const address = server.address();
  const base = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}`;
  let cookie = '';
  const call = async (path: string, init: RequestInit = {}) => {
    const res = await fetch(base + path, { ...init, headers: { ...(init.headers ?? {}), cookie } });
    const set = res.headers.getSetCookie().map((value) => value.split(';')[0]);
    if (set.length > 0) cookie = set.join('; ');
    return res;
  };
  const { token } = (await (await call('/api/auth/csrf')).json()) as { token: string };
  const login = await call('/api/auth/login', {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': token },
    body: JSON.stringify({ email, password }),
  });
  const { csrfToken } = (await login.json()) as { csrfToken: string };

  const importOnce = async (label: string) => {
    const form = new FormData();
    form.append('file', new Blob([csv], { type: 'text/csv' }), 'group-history.csv');
    const started = performance.now();
    const cpuBefore = process.cpuUsage();
    const res = await call('/api/imports?wait=0', {
      method: 'POST',
      headers: { 'x-csrf-token': csrfToken },
      body: form,
    });
    const created = (await res.json()) as { id: number; error?: unknown };
    if (!created.id) throw new Error(`upload refused: ${JSON.stringify(created)}`);
    let body: Record<string, unknown>;
    let busy = 0;
    do {
      await new Promise((done) => setTimeout(done, 200));
      const polled = await call(`/api/imports/${created.id}`);
      // A loaded machine may answer a poll 503 (database busy); the import goes on, so poll again.
      if (polled.status !== 200) {
        busy++;
        body = { status: 'running' };
        continue;
      }
      body = (await polled.json()) as Record<string, unknown>;
    } while (body.status === 'running');
    if (busy > 0) console.log(`(${busy} progress polls were answered busy and repeated)`);
    const seconds = (performance.now() - started) / 1000;
    const cpu = process.cpuUsage(cpuBefore);
    console.log(
      `${label}: ${seconds.toFixed(1)} s — status ${body.status}, ${body.total} rows: accepted ` +
        `${body.accepted}, rejected ${body.rejected}, duplicates ${body.duplicates}, new compounds ` +
        `${body.newCompounds} (${(ROWS / seconds).toFixed(0)} rows/s; CPU of this process incl. worker threads ` +
        `${((cpu.user + cpu.system) / 1e6).toFixed(1)} s)`,
    );
    return { seconds, status: body.status };
  };

  const load = () =>
    globalThis.process.platform === 'linux'
      ? ` (load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores)`
      : '';
  console.log(`Starting${load()}.`);
  const first = await importOnce('First import (end to end)');
  await importOnce('Same file again (all duplicates)');
  console.log(
    `Target ≤ 30 s for the first import: ${first.seconds <= 30 && first.status === 'completed' ? 'met' : 'NOT met'} ` +
      `(${first.seconds.toFixed(1)} s, ${first.status})${load()}.`,
  );
  server.close();
  await close();
  await sequelize.close();
}

try {
  await main();
} finally {
  own?.cleanup();
}
process.exit(0);
