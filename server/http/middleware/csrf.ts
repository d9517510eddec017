import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../errors';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The session's CSRF token (synchroniser-token pattern), created on first use. */
export function csrfToken(req: Request): string {
  req.session.csrfToken ??= randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

/** Every state-changing request must echo the session's token in `X-CSRF-Token`. */
export const requireCsrf: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  // A personal API token in Authorization (auth/bearer.ts) is no ambient credential a browser sends on its own.
  if (req.apiToken) return next();
  const sent = req.get('x-csrf-token') ?? '';
  const expected = req.session?.csrfToken ?? '';
  // Digests have one length whatever was sent (a non-ASCII token of the right length has more bytes).
  const digest = (text: string) => createHash('sha256').update(text, 'utf8').digest();
  const ok = expected.length > 0 && timingSafeEqual(digest(sent), digest(expected));
  if (!ok)
    return next(
      new AppError(403, 'csrf', 'Missing or stale CSRF token: fetch GET /api/auth/csrf and send it in X-CSRF-Token.'),
    );
  next();
};
