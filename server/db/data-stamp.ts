import { performance } from 'node:perf_hooks';
import type { Request, RequestHandler } from 'express';
import { QueryTypes } from 'sequelize';
import { sequelize } from './sequelize';

/**
 * Stamps of the data a read may see, from one small query:
 * - the data stamp, PostgreSQL's current snapshot as text (`xmin:xmax:xip,…`). Two equal stamps mean the same
 *   set of committed transactions, hence the same rows in every table; any commit that wrote anything (in
 *   any process) gives a different stamp, while reads alone never change it. Session and user caches use it.
 * - the content stamp, the version the database keeps of the group's content (migration
 *   202612030100-content-version: raised at the commit of any change to records, compounds, users and the
 *   rest, not by sign-ins, sessions, bookmarks or throttle counters). Answers computed from content (records,
 *   search, Scout) are reused for as long as it stays the same — never after a content write.
 *
 * A caller gets the stamp of a query that began no earlier than `since` (default: now), so a write committed
 * before that moment is always covered. Callers share queries: one in flight that began late enough, or the
 * last one answered, serves them all; otherwise they wait for the next.
 */
interface Stamps {
  data: string;
  content: string;
}
interface Reading {
  startedAt: number;
  promise: Promise<Stamps>;
}

let inFlight: Reading | null = null;
let queued: Promise<Stamps> | null = null;
let latest: { startedAt: number; stamps: Stamps } | null = null;

const STAMPS_SQL =
  `SELECT pg_current_snapshot()::text AS data, 'content:' || (SELECT version FROM ` +
  `data_versions WHERE name = 'content') AS content`;

function start(): Reading {
  const startedAt = performance.now();
  const promise = sequelize
    .query<Stamps>(STAMPS_SQL, { type: QueryTypes.SELECT })
    .then(([row]) => {
      // Without a content version (its row gone) the snapshot serves: never a stamp that stays put through writes.
      const stamps = { data: row.data, content: row.content ?? row.data };
      if (!latest || latest.startedAt < startedAt) latest = { startedAt, stamps };
      return stamps;
    })
    .finally(() => {
      if (inFlight?.promise === promise) inFlight = null;
    });
  inFlight = { startedAt, promise };
  return inFlight;
}

/** Both stamps as of `since` or later (one small query, shared by the callers that may share it). */
function stamps(since: number): Promise<Stamps> {
  if (latest && latest.startedAt >= since) return Promise.resolve(latest.stamps);
  if (!inFlight) return start().promise;
  if (inFlight.startedAt >= since) return inFlight.promise;
  queued ??= inFlight.promise
    .then(
      () => undefined,
      () => undefined,
    )
    .then(() => {
      queued = null;
      return (inFlight ?? start()).promise;
    });
  return queued;
}

/** The data stamp as of `since` or later (default: now). */
export function dataStamp(since = performance.now()): Promise<string> {
  return stamps(since).then((read) => read.data);
}

/** The content stamp as of `since` or later (default: now). */
export function contentStamp(since = performance.now()): Promise<string> {
  return stamps(since).then((read) => read.content);
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

/** The content stamp for a request, likewise from a query that began after it arrived. */
export function requestContentStamp(req: Request | object): Promise<string> {
  return contentStamp(arrivals.get(req));
}
