import type { InputHTMLAttributes } from 'react';
import { TextField } from '../../../components/ui/field';
import { PASSWORD_MIN_LENGTH } from '../../../../shared/schemas/password-rules';

/** A new password input with the rule stated up front (the same rule the server applies). */
export function NewPasswordField({
  label = 'New password',
  error,
  ...input
}: { label?: string; error?: string } & InputHTMLAttributes<HTMLInputElement>) {
  return (
    <TextField
      label={label}
      type="password"
      autoComplete="new-password"
      required
      error={error}
      hint={`At least ${PASSWORD_MIN_LENGTH} characters, and not a common or predictable password. A few unrelated words work well.`}
      {...input}
    />
  );
}
