import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import pg from 'pg';
import { env } from '../config/env';
import { logger } from '../http/logger';
import { cacheSessionReads } from './session-cache';

const PgStore = connectPgSimple(session);

/**
 * Sessions live in PostgreSQL (table `sessions`, created by a migration) so app servers stay stateless.
 * The cookie is not rolling (it ends 14 days after sign-in), so the store's expiry is written when the session
 * is saved and never "touched" by reads; reads are cached briefly (auth/session-cache.ts), so a signed-in read
 * usually costs no session query at all.
 */
export function sessionMiddleware() {
  const pool = new pg.Pool({ connectionString: env().DATABASE_URL, max: 5, connectionTimeoutMillis: 3_000 });
  // An idle connection dropped (e.g. the database restarted): the pool replaces it; say so rather than stay silent.
  pool.on('error', (err) => logger.warn({ err }, 'session store connection failed'));
  const store = cacheSessionReads(
    new PgStore({
      pool,
      tableName: 'sessions',
      createTableIfMissing: false,
      pruneSessionInterval: 15 * 60,
      disableTouch: true,
    }),
  );
  const production = env().NODE_ENV === 'production';
  return {
    pool,
    store,
    middleware: session({
      name: 'rfolio.sid',
      store,
      secret: env().sessionSecret,
      resave: false,
      saveUninitialized: false,
      rolling: false,
      cookie: { httpOnly: true, sameSite: 'lax', secure: production, maxAge: 14 * 24 * 3600 * 1000 },
    }),
  };
}
