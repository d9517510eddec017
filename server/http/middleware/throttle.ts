import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { env } from '../../config/env';
import { PgRateLimitStore } from '../../auth/pg-rate-limit-store';
import { MemoryAttemptStore, PgAttemptStore, type AttemptStore } from '../../auth/sign-in-waits';
import { logger } from '../logger';
import { isKnownDevice } from '../../auth/known-device';

const windowMs = () => env().SIGNIN_WINDOW_MINUTES * 60_000;

/**
 * Where the counters live: PostgreSQL in production (shared by every app server behind a load balancer),
 * process memory elsewhere (each test file's app counts on its own). SIGNIN_THROTTLE_STORE overrides.
 */
function counters(prefix: string) {
  const kind = env().SIGNIN_THROTTLE_STORE ?? (env().NODE_ENV === 'production' ? 'postgres' : 'memory');
  return kind === 'postgres' ? { store: new PgRateLimitStore(prefix) } : {};
}

/** The one JSON error shape, with the wait in minutes. */
function tooMany(what: string): RequestHandler {
  return (req, res) => {
    const resetTime = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
    const minutes = resetTime
      ? Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 60_000))
      : env().SIGNIN_WINDOW_MINUTES;
    res.status(429).json({
      error: {
        code: 'too_many_attempts',
        message: `Too many failed ${what}. Try again in ${minutes} min.`,
        details: [{ path: '', message: 'Wait before trying again.', retryAfterMinutes: minutes }],
      },
    });
  };
}

const waitStores = new Map<string, AttemptStore>();
/** The sign-in attempt counters: PostgreSQL in production (shared by every app process), memory elsewhere. */
function attemptStore(): AttemptStore {
  const kind = env().SIGNIN_THROTTLE_STORE ?? (env().NODE_ENV === 'production' ? 'postgres' : 'memory');
  let store = waitStores.get(kind);
  if (!store)
    waitStores.set(kind, (store = kind === 'postgres' ? new PgAttemptStore('signin-wait:') : new MemoryAttemptStore()));
  return store;
}

const rules = () => {
  const { SIGNIN_FREE_FAILURES_PER_ACCOUNT, SIGNIN_FREE_FAILURES_PER_ADDRESS, SIGNIN_MAX_WAIT_SECONDS } = env();
  const shared = { maxWaitMs: SIGNIN_MAX_WAIT_SECONDS * 1000, windowMs: windowMs() };
  return {
    account: { ...shared, free: SIGNIN_FREE_FAILURES_PER_ACCOUNT },
    address: { ...shared, free: SIGNIN_FREE_FAILURES_PER_ADDRESS },
  };
};

/** Called when an account's free allowance of failed sign-ins has just been used up (once per run of failures). */
let onAccountGuessed: (email: string, failures: number) => void = () => undefined;
export function whenAccountIsGuessed(handler: (email: string, failures: number) => void) {
  onAccountGuessed = handler;
}

/**
 * Sign-in rate limiting with growing waits per account (the e-mail typed, known or not) and per client address
 * (IPv6 grouped by /56), after NIST SP 800-63B § 5.2.2; see auth/sign-in-waits.ts. A refused attempt answers 429
 * with Retry-After in seconds; the password is not even checked. Only a refused credential (401) stays counted:
 * a success clears the account's failures and gives the address's attempt back, and a malformed request (400)
 * gives both back.
 */
export const signInWaits: RequestHandler = async (req, res, next) => {
  try {
    const store = attemptStore();
    const { account, address } = rules();
    const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase().slice(0, 254) : '';
    const keys = [{ key: `address:${ipKeyGenerator(req.ip ?? '')}`, rule: address, what: 'from this address' }];
    // A browser where the owner signed in before skips the account's wait (auth/known-device.ts).
    if (email && !isKnownDevice(req, email))
      keys.push({ key: `account:${email}`, rule: account, what: 'for this account' });
    const claims = await Promise.all(keys.map(({ key, rule }) => store.claim(key, rule)));
    const refused = claims.flatMap((claim, i) => (claim.ok ? [] : [{ ms: claim.retryAfterMs, what: keys[i].what }]));
    if (refused.length > 0) {
      await Promise.all(keys.filter((_, i) => claims[i].ok).map(({ key }) => store.giveBack(key)));
      const longest = refused.reduce((a, b) => (b.ms > a.ms ? b : a));
      const seconds = Math.max(1, Math.ceil(longest.ms / 1000));
      res
        .set('Retry-After', String(seconds))
        .status(429)
        .json({
          error: {
            code: 'too_many_attempts',
            message: `Too many failed sign-ins ${longest.what}. Try again in ${seconds} s.`,
            details: [{ path: '', message: 'Wait before trying again.', retryAfterSeconds: seconds }],
          },
        });
      return;
    }
    const accountKey = keys[1]?.key;
    const accountClaim = accountKey ? claims[1] : undefined;
    res.on('finish', () => {
      const settle = async () => {
        if (res.statusCode === 401) {
          if (accountClaim?.ok && accountClaim.attempts === account.free)
            onAccountGuessed(email, accountClaim.attempts);
          return;
        }
        await store.giveBack(keys[0].key);
        if (email && res.statusCode < 300) await store.clear(`account:${email}`);
        else if (accountKey) await store.giveBack(accountKey);
      };
      settle().catch((err) => logger.warn({ err }, 'sign-in counters not updated'));
    });
    next();
  } catch (err) {
    next(err);
  }
};

/** Wrong current passwords on the profile page, per signed-in user: the same allowance as sign-in. */
export const passwordChangeByUser = rateLimit({
  windowMs: windowMs(),
  limit: () => env().SIGNIN_MAX_FAILURES_PER_ACCOUNT,
  skipSuccessfulRequests: true,
  requestWasSuccessful: (_req, res) => !res.locals.wrongPassword,
  keyGenerator: (req) => `user:${req.user?.id ?? 'anonymous'}`,
  standardHeaders: false,
  legacyHeaders: false,
  ...counters('password-change:'),
  handler: tooMany('password confirmations'),
});

/** Reset e-mails requested from one address: every well-formed request counts (each one may send mail). */
export const resetRequestsByAddress = rateLimit({
  windowMs: windowMs(),
  limit: () => env().SIGNIN_MAX_FAILURES_PER_ADDRESS,
  skipFailedRequests: true,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  ...counters('reset-request:'),
  handler: tooMany('reset requests from this address'),
});
