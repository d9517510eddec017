import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { AuditEntry, PasswordReset, User } from '../../db/models';
import { AppError } from '../../http/errors';
import { hashToken, newToken } from '../../auth/tokens';
import { hashPassword } from '../../auth/passwords';
import { endSessionsOf } from '../../auth/end-sessions';
import { sendMail } from '../../mail/send';
import { passwordResetMail } from '../../mail/messages';
import { assertPasswordFits, userByEmail } from '../../auth/account-rules';

/** A reset link works once and for one hour. */
const RESET_MINUTES = 60;

/**
 * Mails a reset link when the address belongs to an active account, and does nothing otherwise. The route
 * answers before this runs, so the answer and its timing are the same whether or not the e-mail exists.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await userByEmail(email);
  if (!user || user.status !== 'active') return;
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + RESET_MINUTES * 60_000);
  await sequelize.transaction(async (transaction) => {
    // A newer link replaces every older one still open (as the e-mail and the 410 message say).
    await PasswordReset.update(
      { usedAt: new Date() },
      { where: { userId: user.id, usedAt: { [Op.is]: null } }, transaction },
    );
    await PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt }, { transaction });
    await AuditEntry.create(
      {
        actorId: null,
        action: 'user.password_reset_request',
        subjectType: 'user',
        subjectId: String(user.id),
        details: {},
      },
      { transaction },
    );
  });
  await sendMail(passwordResetMail({ to: user.email, token, expiresAt }));
}

const invalid = () =>
  new AppError(
    410,
    'reset_invalid',
    'This reset link is not valid any more (used, expired or replaced). Ask for a new one.',
  );

async function usableReset(token: string, transaction?: Transaction) {
  const reset = await PasswordReset.findOne({
    where: { tokenHash: hashToken(token) },
    transaction,
    lock: transaction?.LOCK.UPDATE,
  });
  if (!reset || reset.usedAt || reset.expiresAt <= new Date()) throw invalid();
  const user = await User.findByPk(reset.userId, { transaction });
  if (!user || user.status !== 'active') throw invalid();
  return { reset, user };
}

/** When the link still works: its expiry, for the page to show. */
export async function previewPasswordReset(token: string) {
  const { reset } = await usableReset(token);
  return { expiresAt: reset.expiresAt.toISOString() };
}

/** Sets the new password, uses up every open link of that person and ends all their sessions. */
export async function completePasswordReset(token: string, password: string): Promise<void> {
  const { user: preview } = await usableReset(token);
  assertPasswordFits(password, preview);
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    const { user } = await usableReset(token, transaction);
    await user.update({ passwordHash }, { transaction });
    await PasswordReset.update(
      { usedAt: new Date() },
      { where: { userId: user.id, usedAt: { [Op.is]: null } }, transaction },
    );
    const ended = await endSessionsOf(user.id, { transaction });
    await AuditEntry.create(
      {
        actorId: user.id,
        action: 'user.password_reset',
        subjectType: 'user',
        subjectId: String(user.id),
        details: { sessionsEnded: ended },
      },
      { transaction },
    );
  });
}
