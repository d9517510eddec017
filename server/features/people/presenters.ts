import type { AdminUser, Invitation as InvitationDto, InvitationStatus } from '../../../shared/schemas/accounts';
import type { Invitation, User } from '../../db/models';

export function presentAdminUser(user: User): AdminUser {
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    role: user.role,
    status: user.status,
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
    createdAt: user.createdAt.toISOString(),
  };
}

function invitationStatus(inv: Invitation, now = new Date()): InvitationStatus {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  return inv.expiresAt <= now ? 'expired' : 'pending';
}

export function presentInvitation(inv: Invitation & { inviter?: User | null }): InvitationDto {
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role,
    status: invitationStatus(inv),
    invitedBy: inv.inviter ? { id: inv.inviter.id, name: inv.inviter.name } : null,
    expiresAt: inv.expiresAt.toISOString(),
    lastSentAt: inv.lastSentAt.toISOString(),
    sentCount: inv.sentCount,
    createdAt: inv.createdAt.toISOString(),
  };
}
