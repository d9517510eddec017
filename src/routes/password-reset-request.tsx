import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { Button } from '../components/ui/button';
import { TextField } from '../components/ui/field';
import { AuthCard, FormAlert } from '../features/auth/components/auth-card';
import { useRequestPasswordReset } from '../features/auth/api/password-reset';
import { passwordResetRequestSchema, type PasswordResetRequest } from '../../shared/schemas/auth';

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export default function PasswordResetRequestPage() {
  const request = useRequestPasswordReset();
  const form = useForm<PasswordResetRequest>({ resolver: zodResolver(passwordResetRequestSchema) });
  const submit = form.handleSubmit((input) => request.mutate(input));
  return (
    <AuthCard
      title="Forgot your password?"
      footer={
        <Link to="/sign-in" className="inline-block min-h-6 py-0.5 text-front hover:underline">
          Back to sign-in
        </Link>
      }
    >
      {request.isSuccess ? (
        <FormAlert tone="clean">{request.data.message}</FormAlert>
      ) : (
        <form onSubmit={submit} noValidate className="space-y-4">
          <p className="text-sm text-ink-soft">
            Enter the e-mail you sign in with. We will send a link to choose a new password.
          </p>
          <TextField
            label="E-mail"
            type="email"
            autoComplete="username"
            required
            error={form.formState.errors.email?.message}
            {...form.register('email')}
          />
          {request.error && <FormAlert>{request.error.message}</FormAlert>}
          <Button type="submit" variant="primary" className="w-full" disabled={request.isPending}>
            {request.isPending ? 'Sending…' : 'Send the link'}
          </Button>
        </form>
      )}
    </AuthCard>
  );
}
