import { execFileSync } from 'node:child_process';
import { join } from 'node:path';

/** Stops and starts the test PostgreSQL cluster (the one `npm test` started) to exercise fault handling. */
function pgCtl(args: string[]) {
  const bin = process.env.RFOLIO_PG_BIN;
  const data = process.env.RFOLIO_PGDATA;
  if (!bin || !data) throw new Error('RFOLIO_PG_BIN / RFOLIO_PGDATA not set: run through `npm test`.');
  const exe = join(bin, 'pg_ctl');
  const full = ['-D', data, ...args];
  if (process.getuid?.() === 0) execFileSync('runuser', ['-u', 'postgres', '--', exe, ...full], { stdio: 'ignore' });
  else execFileSync(exe, full, { stdio: 'ignore' });
}

export function stopPostgres() {
  pgCtl(['-m', 'fast', '-w', 'stop']);
}

export function startPostgres() {
  const port = process.env.RFOLIO_PG_PORT ?? '54339';
  const socket = process.env.RFOLIO_PG_SOCKET ?? '/tmp';
  const logFile = join(process.env.RFOLIO_PGDATA!, '..', 'server.log');
  pgCtl([
    '-l',
    logFile,
    '-w',
    '-t',
    '60',
    '-o',
    `-c listen_addresses=127.0.0.1 -p ${port} -k ${socket} -c fsync=off -c max_connections=200`,
    'start',
  ]);
}
