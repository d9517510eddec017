import { sequelize } from '../../db/sequelize';
import { AuditEntry, User } from '../../db/models';
import { ConflictError, NotFoundError } from '../../http/errors';
import { endSessionsOf } from '../../auth/end-sessions';
import type { AdminUserUpdate } from '../../../shared/schemas/accounts';
import type { SessionUser } from '../../../shared/schemas/auth';

/** Everyone in the group, by name. Groups are tens to a few hundred people, so one page holds them all. */
export function listUsers() {
  return User.findAll({
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
  });
}

export async function getUser(id: number) {
  const user = await User.findByPk(id);
  if (!user) throw new NotFoundError('User');
  return user;
}

/**
 * Changes a person's role and/or status. Disabling ends their sessions at once. The last active admin can
 * be neither demoted nor disabled: the active admins' rows are locked first, so two admins demoting each
 * other at the same moment cannot both succeed.
 */
export async function updateUser(actor: SessionUser, id: number, change: AdminUserUpdate) {
  return sequelize.transaction(async (transaction) => {
    const admins = await User.findAll({
      where: { role: 'admin', status: 'active' },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const user = await User.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw new NotFoundError('User');
    const isActiveAdmin = user.role === 'admin' && user.status === 'active';
    const losesAdmin = (change.role !== undefined && change.role !== 'admin') || change.status === 'disabled';
    if (isActiveAdmin && losesAdmin && admins.length <= 1) {
      throw new ConflictError('The group needs at least one active admin: make someone else an admin first.');
    }
    const audits: { action: string; details: Record<string, unknown> }[] = [];
    if (change.role !== undefined && change.role !== user.role) {
      audits.push({ action: 'user.role', details: { from: user.role, to: change.role } });
      user.role = change.role;
    }
    if (change.status !== undefined && change.status !== user.status) {
      audits.push({ action: change.status === 'disabled' ? 'user.disable' : 'user.enable', details: {} });
      user.status = change.status;
    }
    await user.save({ transaction });
    if (change.status === 'disabled' && audits.some((a) => a.action === 'user.disable')) {
      const ended = await endSessionsOf(user.id, { transaction });
      audits.find((a) => a.action === 'user.disable')!.details.sessionsEnded = ended;
    }
    for (const a of audits) {
      await AuditEntry.create(
        {
          actorId: actor.id,
          action: a.action,
          subjectType: 'user',
          subjectId: String(user.id),
          details: { email: user.email, ...a.details },
        },
        { transaction },
      );
    }
    return user;
  });
}
