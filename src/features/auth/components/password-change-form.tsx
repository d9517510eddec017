import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { passwordChangeSchema, type PasswordChange } from '../../../../shared/schemas/auth';
import { useChangePassword } from '../api/profile';
import { FormAlert } from './auth-card';
import { NewPasswordField } from './new-password-field';

/** Current and new password; the server ends every other session of the person. */
export function PasswordChangeForm() {
  const change = useChangePassword();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<PasswordChange>({ resolver: zodResolver(passwordChangeSchema) });
  const submit = form.handleSubmit((input) => {
    setFormError(null);
    change.mutate(input, {
      onSuccess: () => form.reset({ currentPassword: '', newPassword: '' }),
      onError: (err) => setFormError(applyServerErrors(err, form.setError, ['currentPassword', 'newPassword'])),
    });
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-3">
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        required
        error={form.formState.errors.currentPassword?.message}
        {...form.register('currentPassword')}
      />
      <NewPasswordField error={form.formState.errors.newPassword?.message} {...form.register('newPassword')} />
      {formError && <FormAlert>{formError}</FormAlert>}
      {change.isSuccess && (
        <FormAlert tone="clean">Password changed. You stay signed in here; other devices were signed out.</FormAlert>
      )}
      <Button type="submit" variant="primary" disabled={change.isPending}>
        {change.isPending ? 'Changing…' : 'Change password'}
      </Button>
    </form>
  );
}
