import { Op, fn, col, where, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { AuditEntry, Invitation, User } from '../../db/models';
import { AppError, ConflictError, NotFoundError } from '../../http/errors';
import { newToken, hashToken } from '../../auth/tokens';
import { hashPassword } from '../../auth/passwords';
import { sendMail } from '../../mail/send';
import { invitationMail } from '../../mail/messages';
import { assertPasswordFits, userByEmail } from '../../auth/account-rules';
import type { InvitationCreate } from '../../../shared/schemas/accounts';
import type { InvitationAccept, SessionUser } from '../../../shared/schemas/auth';

/** How long an invitation link stays valid (common practice: about a week). */
const INVITATION_DAYS = 7;
const expiry = () => new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);
const withInviter = { include: [{ model: User, as: 'inviter' }] };

async function mailInvitation(inv: Invitation, token: string, inviterName: string) {
  try {
    await sendMail(invitationMail({ to: inv.email, token, role: inv.role, inviterName, expiresAt: inv.expiresAt }));
  } catch (err) {
    const reason = err instanceof AppError ? err.message : 'the mail server refused it';
    throw new AppError(
      502,
      'mail_failed',
      `The invitation is saved but its e-mail was not sent (${reason}). Use “Resend” once mail works.`,
    );
  }
}

const audit = (
  actorId: number | null,
  action: string,
  inv: Invitation,
  details: Record<string, unknown>,
  transaction?: Transaction,
) =>
  AuditEntry.create(
    {
      actorId,
      action,
      subjectType: 'invitation',
      subjectId: String(inv.id),
      details: { email: inv.email, ...details },
    },
    { transaction },
  );

/** Invites an address with a role and e-mails the link; refuses an address that already has an account or an open invitation. */
export async function createInvitation(actor: SessionUser, input: InvitationCreate) {
  if (await userByEmail(input.email)) throw new ConflictError('Someone with this e-mail already has an account.');
  const open = await Invitation.findOne({
    where: { [Op.and]: [where(fn('lower', col('email')), input.email), { acceptedAt: null, revokedAt: null }] },
  });
  if (open)
    throw new ConflictError('An invitation to this address is already open: resend or revoke it.', {
      invitationId: open.id,
    });
  const { token, hash } = newToken();
  const inv = await sequelize.transaction(async (transaction) => {
    const created = await Invitation.create(
      { email: input.email, role: input.role, tokenHash: hash, invitedBy: actor.id, expiresAt: expiry() },
      { transaction },
    );
    await audit(actor.id, 'invitation.create', created, { role: input.role }, transaction);
    return created;
  });
  await mailInvitation(inv, token, actor.name);
  return (await Invitation.findByPk(inv.id, withInviter))!;
}

async function openInvitation(id: number, transaction: Transaction) {
  const inv = await Invitation.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
  if (!inv) throw new NotFoundError('Invitation');
  if (inv.acceptedAt) throw new ConflictError('This invitation has already been accepted.');
  if (inv.revokedAt) throw new ConflictError('This invitation was revoked; send a new one.');
  return inv;
}

/** A new link (the old one stops working) with a fresh expiry, e-mailed again. */
export async function resendInvitation(actor: SessionUser, id: number) {
  const { token, hash } = newToken();
  const inv = await sequelize.transaction(async (transaction) => {
    const found = await openInvitation(id, transaction);
    await found.update(
      { tokenHash: hash, expiresAt: expiry(), sentCount: found.sentCount + 1, lastSentAt: new Date() },
      { transaction },
    );
    await audit(actor.id, 'invitation.resend', found, { sentCount: found.sentCount }, transaction);
    return found;
  });
  await mailInvitation(inv, token, actor.name);
  return (await Invitation.findByPk(inv.id, withInviter))!;
}

export async function revokeInvitation(actor: SessionUser, id: number) {
  await sequelize.transaction(async (transaction) => {
    const inv = await openInvitation(id, transaction);
    await inv.update({ revokedAt: new Date(), revokedBy: actor.id }, { transaction });
    await audit(actor.id, 'invitation.revoke', inv, {}, transaction);
  });
  return (await Invitation.findByPk(id, withInviter))!;
}

/** Open invitations (pending or expired), or every one, newest first. */
export function listInvitations(status: 'open' | 'all') {
  return Invitation.findAll({
    ...withInviter,
    where: status === 'open' ? { acceptedAt: null, revokedAt: null } : {},
    order: [['createdAt', 'DESC']],
  });
}

/** The invitation behind a link, or the reason it no longer works (404 unknown, 410 used, revoked or expired). */
export async function usableInvitation(token: string, transaction?: Transaction) {
  const where = { tokenHash: hashToken(token) };
  const inv = transaction
    ? await Invitation.findOne({ where, transaction, lock: transaction.LOCK.UPDATE })
    : await Invitation.findOne({ where, ...withInviter });
  if (!inv)
    throw new AppError(
      404,
      'invitation_invalid',
      'This invitation link is not valid. Ask your group’s admin for a new one.',
    );
  if (inv.acceptedAt)
    throw new AppError(410, 'invitation_used', 'This invitation has already been used. Sign in instead.');
  if (inv.revokedAt)
    throw new AppError(
      410,
      'invitation_revoked',
      'This invitation was withdrawn. Ask your group’s admin if you still need access.',
    );
  if (inv.expiresAt <= new Date())
    throw new AppError(410, 'invitation_expired', 'This invitation has expired. Ask your group’s admin to resend it.');
  return inv as Invitation & { inviter?: User | null };
}

/** Creates the invitee's account with the invited role; the link is used up in the same transaction. */
export async function acceptInvitation(token: string, input: InvitationAccept) {
  const preview = await usableInvitation(token);
  assertPasswordFits(input.password, { email: preview.email, name: input.name });
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const inv = await usableInvitation(token, transaction);
    if (await userByEmail(inv.email, transaction))
      throw new ConflictError('Someone with this e-mail already has an account. Sign in instead.');
    const user = await User.create(
      { email: inv.email, name: input.name, role: inv.role, passwordHash },
      { transaction },
    );
    await inv.update({ acceptedAt: new Date(), acceptedUserId: user.id }, { transaction });
    await audit(user.id, 'invitation.accept', inv, { userId: user.id, role: inv.role }, transaction);
    return user;
  });
}
