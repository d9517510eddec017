import type { Request, RequestHandler } from 'express';
import { roleAtLeast, type AccessLevel } from '../../../shared/schemas/auth';
import { ForbiddenError, UnauthenticatedError } from '../errors';

const READS = new Set(['GET', 'HEAD']);

/** Marks a handler as a route's declared access level; the route-matrix test looks for this tag. */
export type AccessHandler = RequestHandler & { access: AccessLevel };

/**
 * `allow(level)` must be the first handler of every API route. 'public' lets anyone through;
 * a role lets that role and every role above it. Anything undeclared is refused by `denyUndeclared`.
 */
export function allow(level: AccessLevel): AccessHandler {
  const handler = ((req, _res, next) => {
    if (req.apiToken?.readOnly && !READS.has(req.method)) {
      return next(new ForbiddenError('This API token is read-only.'));
    }
    if (level === 'public') return next();
    if (!req.user) return next(new UnauthenticatedError());
    if (!roleAtLeast(req.user.role, level)) return next(new ForbiddenError());
    next();
  }) as AccessHandler;
  handler.access = level;
  return handler;
}

export function currentUser(req: Request) {
  if (!req.user) throw new UnauthenticatedError();
  return req.user;
}
