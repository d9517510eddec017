import { createHash, randomBytes } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, MemoryStore, type Options, type Store } from 'express-rate-limit';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';
import { env } from '../config/env';
import { logger } from '../http/logger';
import { AppError, UnauthenticatedError } from '../http/errors';
import { PgRateLimitStore } from './pg-rate-limit-store';
import { sessionUserRow } from './user-cache';
import { toSessionUser } from './passport';
import { API_TOKEN_PATTERN } from '../../shared/schemas/tokens';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** Set when the request was authenticated by `Authorization: Bearer <personal API token>`. */
      apiToken?: { id: number; readOnly: boolean };
    }
  }
}

/** `last_used_at` is written at most this often per token (ms), so a busy script does not write on every call. */
const LAST_USED_GRANULARITY_MS = 60_000;

/** SHA-256 hex of a personal API token: what the database keeps. */
export function hashApiToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A new personal API token (`rfo_` + 32 random bytes in base64url), its hash and a short prefix to recognise it. */
export function newApiToken(): { token: string; hash: string; prefix: string } {
  const token = `rfo_${randomBytes(32).toString('base64url')}`;
  return { token, hash: hashApiToken(token), prefix: token.slice(0, 8) };
}

/** The credential of `Authorization: Bearer <credential>` (scheme case-insensitive, RFC 6750), or undefined. */
function bearerCredential(req: Request): string | undefined {
  const header = req.get('authorization');
  const match = header ? /^Bearer[ \t]+(\S*)[ \t]*$/i.exec(header) : null;
  return match ? match[1] : header && /^Bearer\b/i.test(header) ? '' : undefined;
}

/**
 * Refused tokens per client address, with the sign-in allowance, window and store (SIGNIN_MAX_FAILURES_PER_ADDRESS per
 * SIGNIN_WINDOW_MINUTES; PostgreSQL in production). Only a refusal is counted, so a script's good calls write nothing;
 * once an address has used up its allowance, every Bearer request from it is answered 429 until the window ends.
 */
class TokenFailureThrottle {
  private store: Store | undefined;

  private counters(): Store {
    if (this.store) return this.store;
    const kind = env().SIGNIN_THROTTLE_STORE ?? (env().NODE_ENV === 'production' ? 'postgres' : 'memory');
    const store: Store = kind === 'postgres' ? new PgRateLimitStore('api-token-address:') : new MemoryStore();
    store.init?.({ windowMs: env().SIGNIN_WINDOW_MINUTES * 60_000 } as Options);
    this.store = store;
    return store;
  }

  private key(req: Request) {
    return ipKeyGenerator(req.ip ?? '');
  }

  /** Minutes until the address may try again, or 0 when it has allowance left. */
  async blockedMinutes(req: Request): Promise<number> {
    const info = await this.counters().get?.(this.key(req));
    if (!info || info.totalHits < env().SIGNIN_MAX_FAILURES_PER_ADDRESS) return 0;
    const left = (info.resetTime?.getTime() ?? Date.now()) - Date.now();
    return left > 0 ? Math.max(1, Math.ceil(left / 60_000)) : 0;
  }

  async refused(req: Request): Promise<void> {
    await this.counters().increment(this.key(req));
  }
}

const throttle = new TokenFailureThrottle();

function tooMany(minutes: number) {
  return new AppError(
    429,
    'too_many_attempts',
    `Too many refused API tokens from this address. Try again in ${minutes} min.`,
    {
      retryAfterMinutes: minutes,
    },
  );
}

type TokenRow = { id: number; user_id: number; read_only: boolean; stale: boolean };

async function usableToken(credential: string): Promise<TokenRow | undefined> {
  if (!API_TOKEN_PATTERN.test(credential)) return undefined;
  const [row] = await sequelize.query<TokenRow>(
    `SELECT id, user_id, read_only,
            (last_used_at IS NULL OR last_used_at < now() - make_interval(secs => :granularity)) AS stale
       FROM api_tokens
      WHERE token_hash = :hash AND revoked_at IS NULL AND (expires_at IS NULL OR expires_at > now())`,
    {
      replacements: { hash: hashApiToken(credential), granularity: LAST_USED_GRANULARITY_MS / 1000 },
      type: QueryTypes.SELECT,
    },
  );
  return row;
}

function refuse(res: Parameters<RequestHandler>[1]) {
  res.set('WWW-Authenticate', 'Bearer realm="rfolio", error="invalid_token"');
  return new UnauthenticatedError('The API token is unknown, expired or revoked, or its owner can no longer sign in.');
}

/**
 * Authenticates `Authorization: Bearer <token>`: the request acts as the token's owner, with the owner's role as it
 * is now (the user row is read through the user cache, which follows every committed change at once), and only
 * reads when the token is read-only (see allow() in http/middleware/access.ts). It needs no cookie and no CSRF token;
 * any session user is set aside. An unknown, expired or revoked token, or one whose owner is disabled, gets 401.
 */
const authenticateBearer: RequestHandler = async (req, res, next) => {
  const credential = bearerCredential(req);
  if (credential === undefined) return next();
  try {
    req.user = undefined;
    const wait = await throttle.blockedMinutes(req);
    if (wait > 0) {
      res.set('Retry-After', String(wait * 60));
      return next(tooMany(wait));
    }
    const token = await usableToken(credential);
    const owner = token ? await sessionUserRow(token.user_id, req) : null;
    if (!token || !owner || owner.status !== 'active') {
      await throttle.refused(req);
      return next(refuse(res));
    }
    req.user = toSessionUser(owner);
    req.apiToken = { id: token.id, readOnly: token.read_only };
    if (token.stale) {
      await sequelize
        .query('UPDATE api_tokens SET last_used_at = now() WHERE id = :id', { replacements: { id: token.id } })
        .catch((err) => {
          logger.warn({ err, tokenId: token.id }, 'could not note when an API token was last used');
        });
    }
    next();
  } catch (err) {
    next(err);
  }
};

/** Mounted under /api after the session middleware and before the CSRF check. */
export const bearerAuth: RequestHandler[] = [authenticateBearer];
