import type { Transaction } from 'sequelize';
import { User } from '../models';
import type { Role } from '../../shared/schemas/auth';

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
 * How long a user row read for a session is reused (ms). Changes made through the models in this process
 * evict it at once (hooks below, again after their transaction commits); a change made by another process
 * shows within this time. Ending someone's sessions deletes their session rows, which is never cached.
 */
export const USER_CACHE_TTL_MS = 5_000;

const entries = new Map<number, { row: SessionUserRow; until: number }>();
const loading = new Map<number, Promise<SessionUserRow | null>>();
let generation = 0;

/** Drops one user's cached row (or every row): the next request reads the database again. */
export function forgetSessionUser(id?: number) {
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
  const row = await User.findByPk(id, { attributes: ['id', 'email', 'name', 'role', 'status', 'sessionsValidAfter'], raw: true });
  return row ? { ...row, sessionsValidAfter: new Date(row.sessionsValidAfter) } : null;
}

/** The user row behind a session: from the cache when fresh, otherwise one query shared by concurrent requests. */
export async function sessionUserRow(id: number): Promise<SessionUserRow | null> {
  const cached = entries.get(id);
  if (cached && cached.until > Date.now()) return cached.row;
  const inFlight = loading.get(id);
  if (inFlight) return inFlight;
  const startedAt = generation;
  const promise = read(id).finally(() => {
    if (loading.get(id) === promise) loading.delete(id);
  });
  loading.set(id, promise);
  const row = await promise;
  // A change while the row was being read may have made it stale: use it for this request, do not keep it.
  if (row && startedAt === generation) entries.set(id, { row, until: Date.now() + USER_CACHE_TTL_MS });
  return row;
}

function forgetNowAndAfterCommit(id: number | undefined, transaction: Transaction | null | undefined) {
  forgetSessionUser(id);
  transaction?.afterCommit(() => forgetSessionUser(id));
}

User.addHook('afterSave', 'session-user-cache', (user: User, options: { transaction?: Transaction | null }) => forgetNowAndAfterCommit(user.id, options.transaction));
User.addHook('afterDestroy', 'session-user-cache', (user: User, options: { transaction?: Transaction | null }) => forgetNowAndAfterCommit(user.id, options.transaction));
User.addHook('afterBulkUpdate', 'session-user-cache', (options: { transaction?: Transaction | null }) => forgetNowAndAfterCommit(undefined, options.transaction));
User.addHook('afterBulkDestroy', 'session-user-cache', (options: { transaction?: Transaction | null }) => forgetNowAndAfterCommit(undefined, options.transaction));
