import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { profileUpdateSchema, type ProfileUpdate } from '../../../../shared/schemas/auth';
import { useUpdateProfile } from '../api/profile';
import { FormAlert } from './auth-card';

/** The name shown on the person's records and in the account menu. */
export function ProfileNameForm({ name }: { name: string }) {
  const update = useUpdateProfile();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ProfileUpdate>({ resolver: zodResolver(profileUpdateSchema), defaultValues: { name } });
  const submit = form.handleSubmit((input) =>
    update.mutate(input, {
      onSuccess: (me) => form.reset({ name: me.user?.name ?? input.name }),
      onError: (err) => setFormError(applyServerErrors(err, form.setError, ['name'])),
    }),
  );
  return (
    <form onSubmit={submit} noValidate className="space-y-3">
      <TextField
        label="Name"
        autoComplete="name"
        required
        error={form.formState.errors.name?.message}
        {...form.register('name')}
      />
      {formError && <FormAlert>{formError}</FormAlert>}
      {update.isSuccess && !form.formState.isDirty && <FormAlert tone="clean">Name saved.</FormAlert>}
      <Button type="submit" variant="primary" disabled={update.isPending || !form.formState.isDirty}>
        Save name
      </Button>
    </form>
  );
}
