import type { SessionData, Store } from 'express-session';
import { dataStamp } from '../db/data-stamp';

/**
 * How long a session read from PostgreSQL is reused by this process at most (ms). It is reused only while the
 * data stamp (db/data-stamp.ts) is unchanged, so a sign-out or any other change to the sessions table —
 * through this process, another one or plain SQL — applies to the very next request.
 */
export const SESSION_CACHE_TTL_MS = 5_000;
const MAX_ENTRIES = 10_000;

type Callback<T = void> = (err: unknown, value?: T) => void;
type StoreMethods = Pick<Store, 'get' | 'set' | 'destroy'>;

/**
 * Puts a small read-through cache in front of a session store's `get`, so a signed-in read costs no session
 * query while the cache is fresh. Entries are kept as JSON (express-session mutates what `get` returns) and
 * never outlive the session's own expiry.
 */
export function cacheSessionReads<S extends StoreMethods>(
  store: S,
  currentStamp: () => Promise<string> = dataStamp,
): S {
  const entries = new Map<string, { json: string; until: number; stamp: string }>();
  const get = store.get.bind(store);
  const set = store.set.bind(store);
  const destroy = store.destroy.bind(store);

  const remember = (sid: string, session: SessionData, stamp: string) => {
    const expires = session.cookie?.expires ? new Date(session.cookie.expires).getTime() : Infinity;
    entries.delete(sid);
    entries.set(sid, {
      json: JSON.stringify(session),
      until: Math.min(Date.now() + SESSION_CACHE_TTL_MS, expires),
      stamp,
    });
    if (entries.size > MAX_ENTRIES) entries.delete(entries.keys().next().value as string);
  };

  store.get = (sid: string, callback: Callback<SessionData | null>) => {
    currentStamp().then(
      (stamp) => {
        const hit = entries.get(sid);
        if (hit && hit.until > Date.now() && hit.stamp === stamp)
          return callback(null, JSON.parse(hit.json) as SessionData);
        entries.delete(sid);
        get(sid, (err: unknown, session?: SessionData | null) => {
          if (!err && session) remember(sid, session, stamp);
          callback(err, session);
        });
      },
      (err: unknown) => callback(err),
    );
  };
  // A write moves the data stamp, so what was written is read back once rather than kept under a stamp it predates.
  store.set = (sid: string, session: SessionData, callback?: Callback) => {
    entries.delete(sid);
    set(sid, session, (err: unknown) => {
      entries.delete(sid);
      callback?.(err);
    });
  };
  store.destroy = (sid: string, callback?: Callback) => {
    entries.delete(sid);
    destroy(sid, (err: unknown) => {
      entries.delete(sid);
      callback?.(err);
    });
  };
  return store;
}
