import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { loggableUrl, logger } from './logger';
import { env, trustProxySetting } from '../config/env';
import { sessionMiddleware } from '../auth/session';
import { passport } from '../auth/passport';
import { bearerAuth } from '../auth/bearer';
import { requireCsrf } from './middleware/csrf';
import { errorHandler, apiNotFound } from './middleware/errors';
import { apiRouter } from './routes';
import { usesMailCatcher } from '../mail/send';
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
  // X-Forwarded-For counts only when it comes from a configured proxy (TRUST_PROXY); by default no client is one.
  app.set('trust proxy', trustProxySetting(env().TRUST_PROXY));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'script-src': ["'self'"],
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
      // No headers (cookies, CSRF tokens) and no e-mailed tokens in URLs: what a request log needs and no more.
      serializers: {
        req: (req: { id?: unknown; method?: string; url?: string; remoteAddress?: string }) => ({
          id: req.id,
          method: req.method,
          url: loggableUrl(req.url),
          remoteAddress: req.remoteAddress,
        }),
        res: (res: { statusCode?: number }) => ({ statusCode: res.statusCode }),
      },
      customLogLevel: (_req, res, err) =>
        res.statusCode === 503
          ? 'warn'
          : err || res.statusCode >= 500
            ? 'error'
            : res.statusCode >= 400
              ? 'info'
              : 'debug',
    }),
  );
  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api', sessions.middleware, passport.session());
  app.use('/api', bearerAuth);
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
    // The catcher (development dependencies) is loaded only where it can run: never in production.
    const stopCatcher = usesMailCatcher()
      ? import('../mail/catcher').then((catcher) => catcher.stopMailCatcher())
      : undefined;
    await Promise.all([sessions.pool.end(), stopCatcher, stopSearchIndexes(), stopJobs()]);
  };
  return { app, close };
}
