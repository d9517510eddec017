import { AuditEntry, User } from '../../db/models';
import { AppError, UnauthenticatedError } from '../../http/errors';
import { hashPassword, verifyPassword } from '../../auth/passwords';
import { endSessionsOf } from '../../auth/end-sessions';
import { sequelize } from '../../db/sequelize';
import { assertPasswordFits } from '../../auth/account-rules';
import type { PasswordChange } from '../../../shared/schemas/auth';

async function signedInUser(id: number) {
  const user = await User.findByPk(id);
  if (!user || user.status !== 'active') throw new UnauthenticatedError();
  return user;
}

export async function updateProfileName(userId: number, name: string) {
  const user = await signedInUser(userId);
  await user.update({ name });
  return user;
}

export class WrongPasswordError extends AppError {
  constructor() {
    super(400, 'wrong_password', 'Your current password is not right.', [
      { path: 'body.currentPassword', message: 'Not your current password.' },
    ]);
  }
}

/** Checks the current password, stores the new one and ends every other session of the person. */
export async function changePassword(userId: number, input: PasswordChange, keepSid: string): Promise<void> {
  const user = await signedInUser(userId);
  if (!(await verifyPassword(input.currentPassword, user.passwordHash))) throw new WrongPasswordError();
  assertPasswordFits(input.newPassword, user, 'body.newPassword');
  const passwordHash = await hashPassword(input.newPassword);
  await sequelize.transaction(async (transaction) => {
    await user.update({ passwordHash }, { transaction });
    const ended = await endSessionsOf(user.id, { exceptSid: keepSid, transaction });
    await AuditEntry.create(
      {
        actorId: user.id,
        action: 'user.password_change',
        subjectType: 'user',
        subjectId: String(user.id),
        details: { otherSessionsEnded: ended },
      },
      { transaction },
    );
  });
}
