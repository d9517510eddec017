import { env } from './config/env';
import { logger } from './logger';
import { migrator } from './db/migrator';
import { sequelize } from './db/sequelize';
import { createApp } from './app';
import { createHttpServer } from './http-server';
import { seedDemoOnce, demoAccounts } from '../seeders';
import { startMailCatcher } from './mail/catcher';
import { usesMailCatcher } from './mail/send';
import { searchIndexes } from './services/search/process-indexes';

let config;
try {
  config = env();
} catch (err) {
  console.error((err as Error).message);
  process.exit(1);
}

await migrator.up();
if (config.demo) await seedDemoOnce();
await searchIndexes().catch((error) => logger.warn({ err: error }, 'search indexes not built at start; the first search retries'));

const mailCatcherPort = usesMailCatcher() ? await startMailCatcher(config.MAIL_CATCHER_PORT) : null;
if (!usesMailCatcher() && !config.SMTP_HOST) logger.warn('SMTP_HOST is not set: invitations and password resets cannot be e-mailed.');

const { app, close } = createApp();
const server = createHttpServer(app);
server.keepAliveTimeout = 65_000;
server.listen(config.PORT, config.HOST, () => {
  const url = `http://${config.HOST}:${config.PORT}`;
  console.log(`\nRfolio is serving ${url}`);
  if (config.demo) {
    console.log('Demo sign-ins (invented group, invented records):');
    for (const a of demoAccounts()) console.log(`  ${a.role.padEnd(8)} ${a.email}  password: ${a.password}`);
  }
  if (mailCatcherPort !== null) {
    console.log(`Mail catcher (not in production): smtp://127.0.0.1:${mailCatcherPort}, read it as an admin at ${url}/admin/mailbox`);
  }
  console.log('Stop with Ctrl+C.\n');
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
