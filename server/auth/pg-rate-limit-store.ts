import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * An express-rate-limit store in PostgreSQL (table rate_limit_hits), so every app server behind a load
 * balancer counts against the same limits; one row per key with a fixed window.
 */
export class PgRateLimitStore implements Store {
  localKeys = false;
  private windowMs = 60_000;

  constructor(public readonly prefix: string) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    if (Math.random() < 0.01) await sequelize.query('DELETE FROM rate_limit_hits WHERE reset_at < now()');
    const [row] = await sequelize.query<{ hits: number; reset_at: Date }>(
      `INSERT INTO rate_limit_hits (key, hits, reset_at) VALUES (:key, 1, now() + make_interval(secs => :secs))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 1 ELSE rate_limit_hits.hits + 1 END,
         reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END
       RETURNING hits, reset_at`,
      { replacements: { key: this.prefix + key, secs: this.windowMs / 1000 }, type: QueryTypes.SELECT },
    );
    return { totalHits: row.hits, resetTime: new Date(row.reset_at) };
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [row] = await sequelize.query<{ hits: number; reset_at: Date }>(
      'SELECT hits, reset_at FROM rate_limit_hits WHERE key = :key AND reset_at > now()',
      { replacements: { key: this.prefix + key }, type: QueryTypes.SELECT },
    );
    return row ? { totalHits: row.hits, resetTime: new Date(row.reset_at) } : undefined;
  }

  async decrement(key: string): Promise<void> {
    await sequelize.query(
      'UPDATE rate_limit_hits SET hits = GREATEST(hits - 1, 0) WHERE key = :key AND reset_at > now()',
      {
        replacements: { key: this.prefix + key },
      },
    );
  }

  async resetKey(key: string): Promise<void> {
    await sequelize.query('DELETE FROM rate_limit_hits WHERE key = :key', { replacements: { key: this.prefix + key } });
  }
}
