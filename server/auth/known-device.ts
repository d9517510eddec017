import { createHmac, timingSafeEqual } from 'node:crypto';
import type { Request, Response } from 'express';
import { env } from '../config/env';

/**
 * A browser where an account's owner has signed in before (NIST SP 800-63B § 5.2.2 lets a verifier treat such
 * a device differently while rate limiting): the cookie holds an HMAC of the account's e-mail under the session
 * secret, so it names no one and cannot be made for another account. Such a browser skips the account's wait
 * (someone else's guesses do not keep its owner out at all); the wait per address still applies, and the password
 * is still checked.
 */
const KNOWN_DEVICE_COOKIE = 'rfolio.known';
const YEAR_MS = 365 * 24 * 3600 * 1000;

const tokenFor = (email: string) =>
  createHmac('sha256', env().sessionSecret).update(`known-device:${email.trim().toLowerCase()}`).digest('base64url');

/** Marks this browser as one where `email`'s owner signed in (one cookie per browser: the last account). */
export function rememberDevice(res: Response, email: string): void {
  const production = env().NODE_ENV === 'production';
  const options = { httpOnly: true, sameSite: 'lax' as const, secure: production, maxAge: YEAR_MS, path: '/api/auth' };
  res.cookie(KNOWN_DEVICE_COOKIE, tokenFor(email), options);
}

/** Whether the request comes from a browser where `email`'s owner signed in before. */
export function isKnownDevice(req: Request, email: string): boolean {
  const header = req.headers.cookie ?? '';
  const prefix = `${KNOWN_DEVICE_COOKIE}=`;
  const sent = header
    .split(';')
    .map((part) => part.trim())
    .find((part) => part.startsWith(prefix))
    ?.slice(prefix.length);
  if (!sent || !email) return false;
  const expected = Buffer.from(tokenFor(email));
  const given = Buffer.from(sent);
  return given.length === expected.length && timingSafeEqual(given, expected);
}
