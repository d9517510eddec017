import type { Transaction } from 'sequelize';
import { sequelize } from '../db/sequelize';
import { User } from '../db/models';

/**
 * Ends every session of a user at once: deletes their rows from the session store (connect-pg-simple keeps
 * passport's user id at sess.passport.user) and moves `sessions_valid_after` forward, so a session row
 * written back by a request already in flight is refused too (see deserializeUser in passport.ts).
 * `exceptSid` keeps the caller's own session (a password change from the profile page).
 */
export async function endSessionsOf(userId: number, opts: { exceptSid?: string; transaction?: Transaction } = {}) {
  await User.update({ sessionsValidAfter: new Date() }, { where: { id: userId }, transaction: opts.transaction });
  const [, result] = await sequelize.query(
    `DELETE FROM sessions WHERE (sess -> 'passport' ->> 'user') = :user AND sid <> :except`,
    { replacements: { user: String(userId), except: opts.exceptSid ?? '' }, transaction: opts.transaction },
  );
  return (result as { rowCount?: number } | undefined)?.rowCount ?? 0;
}
