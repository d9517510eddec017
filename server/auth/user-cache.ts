import type { Transaction } from 'sequelize';
import { User } from '../db/models';
import type { Role } from '../../shared/schemas/auth';
import { dataStamp, requestStamp } from '../db/data-stamp';

/** What a request needs of its signed-in user's row to honour the session. */
export interface SessionUserRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  status: 'active' | 'disabled';
  sessionsValidAfter: Date;
}

/**
 * How long a user row read for a session is reused at most (ms). It is reused only while the data stamp
 * (db/data-stamp.ts) is unchanged, so any committed change — by this process, another one or plain SQL —
 * applies to the very next request; changes made through the models in this process also evict it at once.
 */
export const USER_CACHE_TTL_MS = 5_000;

const entries = new Map<number, { row: SessionUserRow; until: number; stamp: string }>();
const loading = new Map<number, { stamp: string; promise: Promise<SessionUserRow | null> }>();
let generation = 0;

/** Drops one user's cached row (or every row): the next request reads the database again. */
function forgetSessionUser(id?: number) {
  generation++;
  if (id === undefined) {
    entries.clear();
    loading.clear();
  } else {
    entries.delete(id);
    loading.delete(id);
  }
}

async function read(id: number): Promise<SessionUserRow | null> {
  const row = await User.findByPk(id, {
    attributes: ['id', 'email', 'name', 'role', 'status', 'sessionsValidAfter'],
    raw: true,
  });
  return row ? { ...row, sessionsValidAfter: new Date(row.sessionsValidAfter) } : null;
}

/**
 * The user row behind a session (of request `req`): from the cache while fresh at the request's data stamp, otherwise
 * one query shared by concurrent requests.
 */
export async function sessionUserRow(id: number, req?: object): Promise<SessionUserRow | null> {
  const stamp = await (req ? requestStamp(req) : dataStamp());
  const cached = entries.get(id);
  if (cached && cached.until > Date.now() && cached.stamp === stamp) return cached.row;
  const inFlight = loading.get(id);
  if (inFlight && inFlight.stamp === stamp) return inFlight.promise;
  const startedAt = generation;
  const promise = read(id).finally(() => {
    if (loading.get(id)?.promise === promise) loading.delete(id);
  });
  loading.set(id, { stamp, promise });
  const row = await promise;
  // A change while the row was being read may have made it stale: use it for this request, do not keep it.
  if (row && startedAt === generation) entries.set(id, { row, until: Date.now() + USER_CACHE_TTL_MS, stamp });
  return row;
}

function forgetNowAndAfterCommit(id: number | undefined, transaction: Transaction | null | undefined) {
  forgetSessionUser(id);
  transaction?.afterCommit(() => forgetSessionUser(id));
}

User.addHook('afterSave', 'session-user-cache', (user: User, options: { transaction?: Transaction | null }) =>
  forgetNowAndAfterCommit(user.id, options.transaction),
);
User.addHook('afterDestroy', 'session-user-cache', (user: User, options: { transaction?: Transaction | null }) =>
  forgetNowAndAfterCommit(user.id, options.transaction),
);
User.addHook('afterBulkUpdate', 'session-user-cache', (options: { transaction?: Transaction | null }) =>
  forgetNowAndAfterCommit(undefined, options.transaction),
);
User.addHook('afterBulkDestroy', 'session-user-cache', (options: { transaction?: Transaction | null }) =>
  forgetNowAndAfterCommit(undefined, options.transaction),
);
