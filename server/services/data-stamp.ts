import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * A stamp of the data a read may see: PostgreSQL's current snapshot as text (`xmin:xmax:xip,…`). Two equal
 * stamps mean the same set of committed transactions, hence the same rows in every table; any commit that
 * wrote anything (in any process) gives a different stamp, while reads alone never change it. Results
 * computed from the database may be reused for as long as the stamp stays the same — never after a write.
 *
 * Concurrent callers share one query, but only a query that began after they asked: a caller arriving while
 * one is in flight waits for the next, so a write committed before the call is always covered.
 */
let inFlight: Promise<string> | null = null;
let queued: Promise<string> | null = null;

async function readStamp(): Promise<string> {
  const [row] = await sequelize.query<{ stamp: string }>('SELECT pg_current_snapshot()::text AS stamp', { type: QueryTypes.SELECT });
  return row.stamp;
}

function start(): Promise<string> {
  const promise = readStamp().finally(() => {
    if (inFlight === promise) inFlight = null;
  });
  inFlight = promise;
  return promise;
}

/** The current data stamp (one small query, shared by the requests that arrive while the previous one runs). */
export function dataStamp(): Promise<string> {
  if (!inFlight) return start();
  queued ??= inFlight.then(
    () => undefined,
    () => undefined,
  ).then(() => {
    queued = null;
    return start();
  });
  return queued;
}
