import type { SessionData, Store } from 'express-session';

/**
 * How long a session read from PostgreSQL is reused by this process (ms). Writes and sign-outs through this
 * process update or drop it at once. Another process's sign-out shows here within this time; ending a
 * person's sessions (disable, password change) also moves their `sessions_valid_after`, which the user
 * check (auth/user-cache.ts, same bound) enforces on every request.
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
export function cacheSessionReads<S extends StoreMethods>(store: S): S {
  const entries = new Map<string, { json: string; until: number }>();
  const get = store.get.bind(store);
  const set = store.set.bind(store);
  const destroy = store.destroy.bind(store);

  const remember = (sid: string, session: SessionData) => {
    const expires = session.cookie?.expires ? new Date(session.cookie.expires).getTime() : Infinity;
    entries.delete(sid);
    entries.set(sid, { json: JSON.stringify(session), until: Math.min(Date.now() + SESSION_CACHE_TTL_MS, expires) });
    if (entries.size > MAX_ENTRIES) entries.delete(entries.keys().next().value as string);
  };

  store.get = (sid: string, callback: Callback<SessionData | null>) => {
    const hit = entries.get(sid);
    if (hit && hit.until > Date.now()) return callback(null, JSON.parse(hit.json) as SessionData);
    entries.delete(sid);
    get(sid, (err: unknown, session?: SessionData | null) => {
      if (!err && session) remember(sid, session);
      callback(err, session);
    });
  };
  store.set = (sid: string, session: SessionData, callback?: Callback) => {
    entries.delete(sid);
    set(sid, session, (err: unknown) => {
      if (!err) remember(sid, session);
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
