import cluster, { type Worker } from 'node:cluster';
import { env, type Env } from './config/env';
import { logger } from './http/logger';
import { migrator } from './db/migrator';
import { sequelize } from './db/sequelize';
import { seedDemoOnce, demoAccounts } from '../seeders';

let config: Env;
try {
  config = env();
} catch (err) {
  console.error((err as Error).message);
  process.exit(1);
}

const url = `http://${config.HOST}:${config.PORT}`;

/** What `npm start` prints once the port is served. */
function announce(mailCatcherPort: number | null) {
  console.log(`\nRfolio is serving ${url}${config.workers > 1 ? ` (${config.workers} app processes)` : ''}`);
  if (config.demo) {
    console.log('Demo sign-ins (invented group, invented records):');
    for (const a of demoAccounts()) console.log(`  ${a.role.padEnd(8)} ${a.email}  password: ${a.password}`);
  }
  if (mailCatcherPort !== null) {
    console.log(
      `Mail catcher (not in production): smtp://127.0.0.1:${mailCatcherPort}, read it as an admin at ${url}/admin/mailbox`,
    );
  }
  console.log('Stop with Ctrl+C.\n');
}

/** One app process: search indexes, (outside production) the mail catcher, the HTTP server. */
async function serve(options: { announce: boolean }) {
  const [{ createApp }, { createHttpServer }, { usesMailCatcher }, { searchIndexes }] = await Promise.all([
    import('./http/app'),
    import('./http/http-server'),
    import('./mail/send'),
    import('./features/search/process-indexes'),
  ]);
  // The catcher's packages are development dependencies: imported only where the catcher runs (never in production).
  const startMailCatcher = async (port: number) => (await import('./mail/catcher')).startMailCatcher(port);
  await searchIndexes().catch((error) =>
    logger.warn({ err: error }, 'search indexes not built at start; the first search retries'),
  );
  const mailCatcherPort = usesMailCatcher() ? await startMailCatcher(config.MAIL_CATCHER_PORT) : null;
  if (options.announce && !usesMailCatcher() && !config.SMTP_HOST)
    logger.warn('SMTP_HOST is not set: invitations and password resets cannot be e-mailed.');

  const { app, close } = createApp();
  // Work on background jobs (imports) here too, so an import a stopped process left is resumed by this one.
  const { startJobs } = await import('./jobs/queue');
  await startJobs().catch((error) => logger.warn({ err: error }, 'job queue not started; the first import starts it'));
  const server = createHttpServer(app);
  server.keepAliveTimeout = 65_000;
  server.listen(config.PORT, config.HOST, () => {
    if (options.announce) announce(mailCatcherPort);
  });

  let closing = false;
  async function shutdown(signal: string) {
    if (closing) return;
    closing = true;
    logger.info({ signal }, 'shutting down');
    server.close();
    server.closeAllConnections();
    await close().catch(() => undefined);
    await sequelize.close().catch(() => undefined);
    process.exit(0);
  }
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}

/**
 * The primary of RFOLIO_WORKERS app processes (node:cluster, connections shared round-robin): it migrates and
 * seeds once, then forks the workers, replaces one that dies, and on SIGINT/SIGTERM stops them all before it
 * exits. Everything the workers share lives in PostgreSQL (sessions, throttle counters, records); each keeps
 * its own search indexes (current through LISTEN/NOTIFY) and per-data-stamp answers.
 */
async function supervise(count: number) {
  let closing = false;
  let announced = false;
  const listened = new Set<number>();
  const fork = () => cluster.fork();
  cluster.on('listening', (worker: Worker) => {
    listened.add(worker.id);
    if (!announced && listened.size === count) {
      announced = true;
      announce(null);
    }
  });
  cluster.on('exit', (worker: Worker, code, signal) => {
    if (closing) return;
    if (!listened.has(worker.id)) {
      // It never served (port taken, database unusable): starting more would fail the same way.
      logger.error({ worker: worker.id, code, signal }, 'an app process exited before serving; stopping');
      void stop('start failed', 1);
      return;
    }
    logger.warn({ worker: worker.id, code, signal }, 'an app process exited; starting another');
    setTimeout(fork, 1_000);
  });

  const stop = async (signal: string, exitCode = 0) => {
    if (closing) return;
    closing = true;
    logger.info({ signal }, 'stopping the app processes');
    const workers = Object.values(cluster.workers ?? {}).filter(
      (worker): worker is Worker => worker !== undefined && !worker.isDead(),
    );
    await Promise.all(
      workers.map(
        (worker) =>
          new Promise((resolve) => {
            worker.once('exit', resolve);
            worker.process.kill('SIGTERM');
          }),
      ),
    );
    await sequelize.close().catch(() => undefined);
    process.exit(exitCode);
  };
  process.on('SIGINT', () => void stop('SIGINT'));
  process.on('SIGTERM', () => void stop('SIGTERM'));
  for (let i = 0; i < count; i++) fork();
}

if (cluster.isWorker) {
  await serve({ announce: false });
} else {
  await migrator.up();
  if (config.demo) await seedDemoOnce();
  if (config.workers > 1) {
    await sequelize.close();
    await supervise(config.workers);
  } else {
    await serve({ announce: true });
  }
}
