import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * Growing waits between failed sign-ins, after NIST SP 800-63B § 5.2.2 (rate limiting): no hard lock-out. A key
 * (one account's e-mail, or one client address) may fail `free` times with no wait; after that each attempt must
 * wait 1 s, 2 s, 4 s … (doubling, at most `maxWaitMs`) after the previous one. So someone else's burst of wrong
 * guesses keeps the right person out for at most `maxWaitMs`, while a guesser gets one try per wait.
 * Failures are forgotten `windowMs` after the last one, and an account's on its owner's successful sign-in.
 */
export interface WaitRule {
  free: number;
  maxWaitMs: number;
  windowMs: number;
}

/** The wait owed after `failures` failed attempts (0 while within the free allowance). */
export function waitAfter(failures: number, rule: WaitRule): number {
  if (failures < rule.free) return 0;
  return Math.min(1000 * 2 ** (failures - rule.free), rule.maxWaitMs);
}

export type Claim = { ok: true; attempts: number } | { ok: false; retryAfterMs: number };

/**
 * Where attempts are counted. `claim` atomically checks the wait and counts the attempt, so a burst of parallel
 * requests is served one wait at a time; `giveBack` uncounts an attempt that turned out not to be a failure.
 */
export interface AttemptStore {
  claim(key: string, rule: WaitRule): Promise<Claim>;
  giveBack(key: string): Promise<void>;
  clear(key: string): Promise<void>;
}

/** Counters in this process (development, tests, a single app process). */
export class MemoryAttemptStore implements AttemptStore {
  private readonly entries = new Map<string, { attempts: number; lastAt: number; forgetAt: number }>();

  async claim(key: string, rule: WaitRule): Promise<Claim> {
    const now = Date.now();
    if (this.entries.size > 50_000) for (const [k, e] of this.entries) if (e.forgetAt <= now) this.entries.delete(k);
    const entry = this.entries.get(key);
    if (!entry || entry.forgetAt <= now) {
      this.entries.set(key, { attempts: 1, lastAt: now, forgetAt: now + rule.windowMs });
      return { ok: true, attempts: 1 };
    }
    const readyAt = entry.lastAt + waitAfter(entry.attempts, rule);
    if (now < readyAt) return { ok: false, retryAfterMs: readyAt - now };
    entry.attempts += 1;
    entry.lastAt = now;
    entry.forgetAt = now + rule.windowMs;
    return { ok: true, attempts: entry.attempts };
  }

  async giveBack(key: string): Promise<void> {
    const entry = this.entries.get(key);
    if (entry) entry.attempts = Math.max(0, entry.attempts - 1);
  }

  async clear(key: string): Promise<void> {
    this.entries.delete(key);
  }
}

/**
 * Counters in PostgreSQL (table rate_limit_hits: hits = attempts, reset_at = last attempt + window), shared by
 * every app process. The check and the count are one statement, so two processes never both let a guess through.
 */
export class PgAttemptStore implements AttemptStore {
  constructor(private readonly prefix: string) {}

  async claim(key: string, rule: WaitRule): Promise<Claim> {
    if (Math.random() < 0.01) await sequelize.query('DELETE FROM rate_limit_hits WHERE reset_at < now()');
    const replacements = {
      key: this.prefix + key,
      windowSecs: rule.windowMs / 1000,
      free: rule.free,
      maxSecs: rule.maxWaitMs / 1000,
    };
    const owed = `CASE WHEN rate_limit_hits.hits < :free THEN 0
      ELSE LEAST(power(2, rate_limit_hits.hits - :free), :maxSecs) END`;
    const claimed = await sequelize.query<{ hits: number }>(
      `INSERT INTO rate_limit_hits (key, hits, reset_at) VALUES (:key, 1, now() + make_interval(secs => :windowSecs))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 1 ELSE rate_limit_hits.hits + 1 END,
         reset_at = EXCLUDED.reset_at
       WHERE rate_limit_hits.reset_at <= now()
          OR now() >= rate_limit_hits.reset_at - make_interval(secs => :windowSecs) + make_interval(secs => ${owed})
       RETURNING hits`,
      { replacements, type: QueryTypes.SELECT },
    );
    if (claimed.length > 0) return { ok: true, attempts: claimed[0].hits };
    const [row] = await sequelize.query<{ ms: number }>(
      `SELECT 1000 * extract(epoch FROM (reset_at - make_interval(secs => :windowSecs) + make_interval(secs => ${owed}) - now())) AS ms
       FROM rate_limit_hits WHERE key = :key`,
      { replacements, type: QueryTypes.SELECT },
    );
    return { ok: false, retryAfterMs: Math.max(1, Number(row?.ms ?? 1)) };
  }

  async giveBack(key: string): Promise<void> {
    await sequelize.query(
      'UPDATE rate_limit_hits SET hits = GREATEST(hits - 1, 0) WHERE key = :key AND reset_at > now()',
      {
        replacements: { key: this.prefix + key },
      },
    );
  }

  async clear(key: string): Promise<void> {
    await sequelize.query('DELETE FROM rate_limit_hits WHERE key = :key', { replacements: { key: this.prefix + key } });
  }
}
