import { performance } from 'node:perf_hooks';
import type { Request, RequestHandler } from 'express';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * A stamp of the data a read may see: PostgreSQL's current snapshot as text (`xmin:xmax:xip,…`). Two equal
 * stamps mean the same set of committed transactions, hence the same rows in every table; any commit that
 * wrote anything (in any process) gives a different stamp, while reads alone never change it. Results
 * computed from the database may be reused for as long as the stamp stays the same — never after a write.
 *
 * A caller gets the stamp of a query that began no earlier than `since` (default: now), so a write committed
 * before that moment is always covered. Callers share queries: one in flight that began late enough, or the
 * last one answered, serves them all; otherwise they wait for the next.
 */
interface Reading { startedAt: number; promise: Promise<string> }

let inFlight: Reading | null = null;
let queued: Promise<string> | null = null;
let latest: { startedAt: number; stamp: string } | null = null;

function start(): Reading {
  const startedAt = performance.now();
  const promise = sequelize.query<{ stamp: string }>('SELECT pg_current_snapshot()::text AS stamp', { type: QueryTypes.SELECT }).then(([row]) => {
    if (!latest || latest.startedAt < startedAt) latest = { startedAt, stamp: row.stamp };
    return row.stamp;
  }).finally(() => {
    if (inFlight?.promise === promise) inFlight = null;
  });
  inFlight = { startedAt, promise };
  return inFlight;
}

/** The data stamp as of `since` or later (one small query, shared by the callers that may share it). */
export function dataStamp(since = performance.now()): Promise<string> {
  if (latest && latest.startedAt >= since) return Promise.resolve(latest.stamp);
  if (!inFlight) return start().promise;
  if (inFlight.startedAt >= since) return inFlight.promise;
  queued ??= inFlight.promise.then(
    () => undefined,
    () => undefined,
  ).then(() => {
    queued = null;
    return (inFlight ?? start()).promise;
  });
  return queued;
}

const arrivals = new WeakMap<object, number>();

/** Notes when each request arrived (first middleware of the app), for `requestStamp`. */
export const noteArrival: RequestHandler = (req, _res, next) => {
  arrivals.set(req, performance.now());
  next();
};

/** The data stamp for a request: from a query that began after the request arrived (the session's, if it had one). */
export function requestStamp(req: Request | object): Promise<string> {
  return dataStamp(arrivals.get(req));
}
