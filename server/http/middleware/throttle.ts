import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { env } from '../../config/env';
import { PgRateLimitStore } from '../../auth/pg-rate-limit-store';

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
    const minutes = resetTime ? Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 60_000)) : env().SIGNIN_WINDOW_MINUTES;
    res.status(429).json({
      error: { code: 'too_many_attempts', message: `Too many failed ${what}. Try again in ${minutes} min.`, details: [{ path: '', message: 'Wait before trying again.', retryAfterMinutes: minutes }] },
    });
  };
}

/** Only a refused credential counts: successes and malformed requests (400) do not use up the allowance. */
const failedCredential = (_req: Request, res: { statusCode: number }) => res.statusCode !== 401;

function emailKey(req: Request): string {
  const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
  return email || `no-email:${ipKeyGenerator(req.ip ?? '')}`;
}

/** Failed sign-ins per client address (IPv6 grouped by /56, as express-rate-limit recommends). */
export const signInByAddress = rateLimit({
  windowMs: windowMs(),
  limit: () => env().SIGNIN_MAX_FAILURES_PER_ADDRESS,
  skipSuccessfulRequests: true,
  requestWasSuccessful: failedCredential,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  ...counters('signin-address:'),
  handler: tooMany('sign-ins from this address'),
});

/** Failed sign-ins per account (the e-mail typed), whatever address they come from. */
export const signInByAccount = rateLimit({
  windowMs: windowMs(),
  limit: () => env().SIGNIN_MAX_FAILURES_PER_ACCOUNT,
  skipSuccessfulRequests: true,
  requestWasSuccessful: failedCredential,
  keyGenerator: emailKey,
  standardHeaders: false,
  legacyHeaders: false,
  ...counters('signin-account:'),
  handler: tooMany('sign-ins for this account'),
});

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
