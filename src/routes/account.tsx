import { Card } from '../components/ui/card';
import { PageLoading } from '../components/ui/page-loading';
import { useMe } from '../features/auth/api/session';
import { ProfileNameForm } from '../features/auth/components/profile-name-form';
import { PasswordChangeForm } from '../features/auth/components/password-change-form';
import { TokensPanel } from '../features/tokens/components/tokens-panel';

/** Profile: the signed-in person's name and password; e-mail and role are set by an admin. */
export default function AccountPage() {
  const { data } = useMe();
  const user = data?.user;
  if (!user) return <PageLoading />;
  return (
    <section className="max-w-2xl space-y-6">
      <header>
        <h1 className="text-2xl font-semibold">Profile and password</h1>
        <p className="mt-1 text-sm text-ink-soft">
          Signed in as <span className="font-medium text-ink">{user.email}</span> with the{' '}
          <span className="font-medium text-ink">{user.role}</span> role. An admin of your group changes e-mail
          addresses and roles.
        </p>
      </header>
      <Card title="Your name">
        <ProfileNameForm name={user.name} />
      </Card>
      <Card title="Password">
        <PasswordChangeForm />
      </Card>
      <Card title="API tokens for scripts">
        <TokensPanel isAdmin={user.role === 'admin'} />
      </Card>
    </section>
  );
}
