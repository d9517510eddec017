import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select';
import { applyServerErrors } from '../../../lib/form-errors';
import { invitationCreateSchema, type InvitationCreate } from '../../../../shared/schemas/accounts';
import { useCreateInvitation } from '../api/invitations';
import { roleOptions, whenShort } from './format';

/** Invite by e-mail with a role; the link goes out by mail and works for a week. */
export function InviteForm() {
  const create = useCreateInvitation();
  const [outcome, setOutcome] = useState<{ tone: 'clean' | 'failed'; text: string } | null>(null);
  const form = useForm<InvitationCreate>({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: { email: '', role: 'member' },
  });
  const submit = form.handleSubmit((input) => {
    setOutcome(null);
    create.mutate(input, {
      onSuccess: (inv) => {
        setOutcome({
          tone: 'clean',
          text: `Invitation sent to ${inv.email} as ${inv.role}; the link works until ${whenShort(inv.expiresAt)}.`,
        });
        form.reset({ email: '', role: input.role });
      },
      onError: (err) => {
        const left = applyServerErrors(err, form.setError, ['email', 'role']);
        if (left) setOutcome({ tone: 'failed', text: left });
      },
    });
  });
  return (
    <form onSubmit={submit} noValidate className="grid grid-cols-1 gap-3 sm:grid-cols-[1fr_16rem_auto] sm:items-start">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="off"
        required
        error={form.formState.errors.email?.message}
        {...form.register('email')}
      />
      <SelectField
        label="Role"
        options={roleOptions}
        error={form.formState.errors.role?.message}
        {...form.register('role')}
      />
      <Button type="submit" variant="primary" className="sm:mt-6" disabled={create.isPending}>
        {create.isPending ? 'Sending…' : 'Send invitation'}
      </Button>
      {outcome && (
        <p
          role={outcome.tone === 'failed' ? 'alert' : 'status'}
          className={`text-sm sm:col-span-3 ${outcome.tone === 'failed' ? 'text-failed' : 'text-clean'}`}
        >
          {outcome.text}
        </p>
      )}
    </form>
  );
}
