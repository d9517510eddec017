import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Button } from '../components/ui/button';
import { PageLoading } from '../components/ui/page-loading';
import { AuthCard, FormAlert } from '../features/auth/components/auth-card';
import { NewPasswordField } from '../features/auth/components/new-password-field';
import { useCompletePasswordReset, useResetPreview } from '../features/auth/api/password-reset';
import { applyServerErrors } from '../lib/form-errors';
import { passwordResetSchema, type PasswordResetInput } from '../../shared/schemas/auth';
import { formatTime } from '../lib/dates';

/** The page behind the mailed reset link: choose a new password, then sign in with it. */
export default function PasswordResetPage() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const preview = useResetPreview(token);
  const complete = useCompletePasswordReset(token);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<PasswordResetInput>({ resolver: zodResolver(passwordResetSchema) });

  const submit = form.handleSubmit((input) =>
    complete.mutate(input, {
      onSuccess: () => navigate('/sign-in?reset=done', { replace: true }),
      onError: (err) => setFormError(applyServerErrors(err, form.setError, ['password'])),
    }),
  );

  if (preview.isLoading) return <PageLoading />;
  return (
    <AuthCard
      title="Choose a new password"
      footer={
        <Link to="/password-reset" className="inline-block min-h-6 py-0.5 text-front hover:underline">
          Ask for a new link
        </Link>
      }
    >
      {preview.error ? (
        <FormAlert>{preview.error.message}</FormAlert>
      ) : (
        <form onSubmit={submit} noValidate className="space-y-4">
          <p className="text-sm text-ink-soft">
            This link works once, until <span className="figure">{formatTime(preview.data!.expiresAt)}</span>. Setting a
            new password signs you out on every device.
          </p>
          <NewPasswordField error={form.formState.errors.password?.message} {...form.register('password')} />
          {formError && <FormAlert>{formError}</FormAlert>}
          <Button type="submit" variant="primary" className="w-full" disabled={complete.isPending}>
            {complete.isPending ? 'Saving…' : 'Set the new password'}
          </Button>
        </form>
      )}
    </AuthCard>
  );
}
