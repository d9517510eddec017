import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Button } from '../components/ui/button';
import { TextField } from '../components/ui/field';
import { PageLoading } from '../components/ui/page-loading';
import { AuthCard, FormAlert } from '../features/auth/components/auth-card';
import { NewPasswordField } from '../features/auth/components/new-password-field';
import { useAcceptInvitation, useInvitationPreview } from '../features/auth/api/invitation';
import { applyServerErrors } from '../lib/form-errors';
import { invitationAcceptSchema, type InvitationAccept } from '../../shared/schemas/auth';

const roleLine = {
  viewer: 'read and bookmark the group’s records',
  member: 'contribute condition records and edit your own',
  curator: 'edit any record, merge duplicates, retire and import',
  admin: 'manage people and invitations, and curate',
} as const;

/** The invitee's page: the invitation's e-mail and role, then a name and a password to join. */
export default function AcceptInvitationPage() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const preview = useInvitationPreview(token);
  const accept = useAcceptInvitation(token);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<InvitationAccept>({ resolver: zodResolver(invitationAcceptSchema) });

  const submit = form.handleSubmit((input) =>
    accept.mutate(input, {
      onSuccess: () => navigate('/', { replace: true }),
      onError: (err) => setFormError(applyServerErrors(err, form.setError, ['name', 'password'])),
    }),
  );

  if (preview.isLoading) return <PageLoading />;
  const inv = preview.data;
  return (
    <AuthCard
      title="Join your group’s Rfolio"
      footer={
        <Link to="/sign-in" className="inline-block min-h-6 py-0.5 text-front hover:underline">
          Already have an account? Sign in
        </Link>
      }
    >
      {!inv ? (
        <FormAlert>{preview.error?.message ?? 'This invitation could not be read.'}</FormAlert>
      ) : (
        <form onSubmit={submit} noValidate className="space-y-4">
          <p className="text-sm text-ink-soft">
            {inv.inviterName ?? 'Your group'} invited <span className="font-medium text-ink">{inv.email}</span> to join
            as <span className="font-medium text-ink">{inv.role}</span>: {roleLine[inv.role]}.
          </p>
          <TextField
            label="Your name"
            autoComplete="name"
            required
            error={form.formState.errors.name?.message}
            {...form.register('name')}
          />
          <NewPasswordField
            label="Choose a password"
            error={form.formState.errors.password?.message}
            {...form.register('password')}
          />
          {formError && <FormAlert>{formError}</FormAlert>}
          <Button type="submit" variant="primary" className="w-full" disabled={accept.isPending}>
            {accept.isPending ? 'Joining…' : 'Join the group'}
          </Button>
        </form>
      )}
    </AuthCard>
  );
}
