import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageLoading } from '../../../components/ui/page-loading';
import { useInvitations, useResendInvitation, useRevokeInvitation } from '../api/invitations';
import { whenShort } from './format';

/** Invitations not yet accepted nor revoked; an expired one can be resent with a fresh link. */
export function OpenInvitations() {
  const { data, isLoading, error } = useInvitations('open');
  const resend = useResendInvitation();
  const revoke = useRevokeInvitation();
  const failure = resend.error ?? revoke.error;
  if (isLoading) return <PageLoading label="Loading invitations…" />;
  if (error)
    return (
      <p role="alert" className="text-failed">
        {error.message}
      </p>
    );
  if (!data?.items.length)
    return (
      <EmptyState title="No open invitations">
        Invite someone above; their invitation waits here until they accept it.
      </EmptyState>
    );
  return (
    <div className="overflow-x-auto">
      {failure && (
        <p role="alert" className="mb-2 text-sm text-failed">
          {failure.message}
        </p>
      )}
      <table className="w-full text-sm">
        <caption className="sr-only">Open invitations</caption>
        <thead className="text-left text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="py-1 pr-3 font-medium">E-mail</th>
            <th className="py-1 pr-3 font-medium">Role</th>
            <th className="py-1 pr-3 font-medium">State</th>
            <th className="py-1 pr-3 font-medium">Link valid until</th>
            <th className="py-1 pr-3 font-medium">Sent</th>
            <th className="py-1 font-medium">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {data.items.map((inv) => (
            <tr key={inv.id} className="border-t border-line">
              <td className="py-2 pr-3">{inv.email}</td>
              <td className="py-2 pr-3">{inv.role}</td>
              <td className={`py-2 pr-3 ${inv.status === 'expired' ? 'text-failed' : 'text-ink-soft'}`}>
                {inv.status}
              </td>
              <td className="py-2 pr-3 figure">{whenShort(inv.expiresAt)}</td>
              <td
                className="py-2 pr-3 figure"
                title={`last sent ${whenShort(inv.lastSentAt)}${inv.invitedBy ? ` by ${inv.invitedBy.name}` : ''}`}
              >
                {inv.sentCount}×
              </td>
              <td className="py-2 whitespace-nowrap text-right">
                <Button
                  size="sm"
                  variant="quiet"
                  disabled={resend.isPending}
                  onClick={() => resend.mutate(inv.id)}
                  aria-label={`Resend invitation to ${inv.email}`}
                >
                  Resend
                </Button>
                <Button
                  size="sm"
                  variant="quiet"
                  disabled={revoke.isPending}
                  onClick={() => revoke.mutate(inv.id)}
                  aria-label={`Revoke invitation to ${inv.email}`}
                >
                  Revoke
                </Button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
