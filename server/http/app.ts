import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { logger } from './logger';
import { env } from '../config/env';
import { sessionMiddleware } from '../auth/session';
import { passport } from '../auth/passport';
import { requireCsrf } from './middleware/csrf';
import { errorHandler, apiNotFound } from './middleware/errors';
import { apiRouter } from './routes';
import { stopMailCatcher } from '../mail/catcher';
import { stopSearchIndexes } from '../features/search/process-indexes';
import { noteArrival } from '../db/data-stamp';
import { stopJobs } from '../jobs/queue';

const clientDir = fileURLToPath(new URL('../../dist/client', import.meta.url));

export type AppHandle = { app: Express; close: () => Promise<void> };

/** Builds the Express app without listening, so tests drive it with supertest. */
export function createApp(): AppHandle {
  const app = express();
  const production = env().NODE_ENV === 'production';
  const sessions = sessionMiddleware();
  app.disable('x-powered-by');
  app.use(noteArrival);
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'script-src': ["'self'", "'unsafe-eval'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'upgrade-insecure-requests': production ? [] : null,
        },
      },
      strictTransportSecurity: production,
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      customLogLevel: (_req, res, err) => (res.statusCode === 503 ? 'warn' : err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'info' : 'debug'),
    }),
  );
  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api', sessions.middleware, passport.session());
  app.use('/api', requireCsrf);
  app.use('/api', apiRouter());
  app.use('/api', apiNotFound);

  if (existsSync(join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1y', immutable: true }));
    app.get('/{*splat}', (_req, res) => {
      res.set('Cache-Control', 'no-cache').sendFile(join(clientDir, 'index.html'));
    });
  }
  app.use(errorHandler);
  const close = async () => {
    await Promise.all([sessions.pool.end(), stopMailCatcher(), stopSearchIndexes(), stopJobs()]);
  };
  return { app, close };
}
