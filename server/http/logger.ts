import pino, { type LoggerOptions } from 'pino';
import { env } from '../config/env';

/**
 * Headers that carry credentials never reach the log (pino's built-in redaction): the session cookie, the CSRF
 * token, an Authorization header and a Set-Cookie answer.
 */
const redactedPaths = [
  'req.headers.cookie',
  'req.headers.authorization',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  'headers.cookie',
  'headers.authorization',
  'headers["x-csrf-token"]',
];

/** @public The options the logger is built with (tests build a capturing logger from them). */
export const loggerOptions: LoggerOptions = {
  level: env().LOG_LEVEL,
  base: { app: 'rfolio' },
  redact: { paths: redactedPaths, censor: '[redacted]' },
};

/** Path segments that are e-mailed secrets (reset and invitation links, API and page alike). */
const TOKEN_IN_PATH = /(\/(?:password-reset|invitations)\/)[^/?#]+/g;
const TOKEN_IN_QUERY = /([?&](?:token|key|code)=)[^&#]*/gi;

/** A URL fit for the log: reset and invitation tokens replaced by "[redacted]". */
export function loggableUrl(url: string | undefined): string | undefined {
  return url?.replace(TOKEN_IN_PATH, '$1[redacted]').replace(TOKEN_IN_QUERY, '$1[redacted]');
}

export const logger = pino(loggerOptions);
