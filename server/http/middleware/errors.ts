import type { ErrorRequestHandler, RequestHandler } from 'express';
import { MulterError } from 'multer';
import { errorDetailsOf } from '../../../shared/schemas/common';
import { AppError, DatabaseUnavailableError, NotFoundError } from '../errors';
import { loggableUrl, logger } from '../logger';

const DB_DOWN = new RegExp(
  [
    'ECONNREFUSED',
    'not queryable',
    'ECONNRESET',
    'terminating connection',
    'Connection terminated',
    'the database system is (shutting down|starting up)',
    'connect ETIMEDOUT',
    'Connection.*timeout',
  ].join('|'),
  'i',
);

/** True for the errors PostgreSQL and its driver give when the database is unreachable or shutting down. */
export function isDatabaseDown(err: unknown): boolean {
  if (!err || typeof err !== 'object') return false;
  const e = err as {
    name?: string;
    message?: string;
    parent?: { code?: string; message?: string };
    original?: unknown;
  };
  if (e.name && /^Sequelize(Connection\w*Error|HostNotReachableError|ConnectionAcquireTimeoutError)$/.test(e.name))
    return true;
  if (e.parent?.code === '57P01' || e.parent?.code === '57P03') return true;
  return DB_DOWN.test(e.message ?? '') || DB_DOWN.test(e.parent?.message ?? '');
}

/** Maps every failure onto `{ error: { code, message, details? } }` with a fitting status; internals never leak. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  // A failure after the answer started (e.g. a session save at shutdown) can no longer be reported to the client.
  if (res.headersSent) {
    if (!isDatabaseDown(err)) logger.warn({ err, path: loggableUrl(req.path) }, 'error after the response was sent');
    req.socket.destroy();
    return;
  }
  let appErr: AppError;
  if (err instanceof AppError) appErr = err;
  else if (isDatabaseDown(err)) appErr = new DatabaseUnavailableError();
  else if (err instanceof MulterError) {
    appErr =
      err.code === 'LIMIT_FILE_SIZE'
        ? new AppError(413, 'too_large', `The file is larger than allowed (${err.field ?? 'file'}).`)
        : new AppError(400, 'bad_upload', `${err.message}${err.field ? ` (field "${err.field}")` : ''}.`);
  } else if (err?.type === 'entity.too.large') appErr = new AppError(413, 'too_large', 'Request body too large.');
  else if (err?.type === 'entity.parse.failed')
    appErr = new AppError(400, 'bad_json', 'The request body is not valid JSON.');
  else if (err?.name === 'SequelizeUniqueConstraintError')
    appErr = new AppError(409, 'conflict', 'That already exists.');
  else if (
    err?.name === 'SequelizeValidationError' ||
    (err?.name === 'SequelizeDatabaseError' && /invalid input/.test(err.message))
  ) {
    appErr = new AppError(400, 'invalid_input', 'The input was not accepted by the database.');
  } else if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500 && err.expose) {
    appErr = new AppError(err.status, 'bad_request', err.message);
  } else {
    appErr = new AppError(500, 'internal', 'Something went wrong on our side; it has been logged.');
  }
  // Logged once, by the request logger (pino-http logs `res.err` with the request line at level error).
  if (appErr.status >= 500 && appErr.status !== 503) res.err = err instanceof Error ? err : new Error(String(err));
  res.status(appErr.status).json({
    error: { code: appErr.code, message: appErr.message, details: errorDetailsOf(appErr.message, appErr.details) },
  });
};

export const apiNotFound: RequestHandler = (req, _res, next) =>
  next(new NotFoundError(`API route ${req.method} ${req.path}`));
