import { Link } from 'react-router-dom';
import { Card } from '../components/ui/card';
import { PageLoading } from '../components/ui/page-loading';
import { useMe } from '../features/auth/api/session';
import { useUsers } from '../features/people/api/users';
import { InviteForm } from '../features/people/components/invite-form';
import { OpenInvitations } from '../features/people/components/open-invitations';
import { PeopleTable } from '../features/people/components/people-table';

/** Admin: invite people, follow open invitations, change roles, disable and enable accounts. */
export default function AdminUsersPage() {
  const me = useMe().data?.user;
  const users = useUsers();
  return (
    <section className="space-y-6">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <div>
          <h1 className="text-2xl font-semibold">People and invitations</h1>
          <p className="mt-1 text-sm text-ink-soft">
            Disabling someone signs them out at once. The group always keeps at least one active admin.
          </p>
        </div>
        <Link to="/admin/mailbox" className="inline-block min-h-6 py-0.5 text-sm text-front hover:underline">
          Local test inbox (not in production)
        </Link>
      </header>
      <Card title="Invite someone">
        <InviteForm />
      </Card>
      <Card title="Open invitations">
        <OpenInvitations />
      </Card>
      <Card title={users.data ? `People (${users.data.total})` : 'People'}>
        {users.isLoading || !me ? (
          <PageLoading label="Loading people…" />
        ) : users.error ? (
          <p role="alert" className="text-failed">
            {users.error.message}
          </p>
        ) : (
          <PeopleTable people={users.data!.items} meId={me.id} />
        )}
      </Card>
    </section>
  );
}
