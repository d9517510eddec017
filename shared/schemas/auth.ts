import { z } from 'zod';
import { passwordProblem } from './password-rules';

/** Roles in increasing order of trust; each includes what the ones before it may do. */
export const roles = ['viewer', 'member', 'curator', 'admin'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** The least access a route needs: anyone at all, any signed-in user, or a role and those above it. */
export type AccessLevel = 'public' | Role;

export function roleAtLeast(role: Role, least: Role): boolean {
  return roles.indexOf(role) >= roles.indexOf(least);
}

export const loginInputSchema = z.object({
  email: z.string().trim().toLowerCase().max(254, { abort: true }).email('Enter an e-mail address.'),
  password: z.string().min(1, 'Enter your password.').max(200),
});
export type LoginInput = z.infer<typeof loginInputSchema>;

export const sessionUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

export const meResponseSchema = z.object({ user: sessionUserSchema.nullable(), firstSignIn: z.boolean().optional() });

/** A new password: at least 12 characters and none of the common or predictable ones (see password-rules.ts). */
export const newPasswordSchema = z.string().superRefine((value, ctx) => {
  const problem = passwordProblem(value);
  if (problem) ctx.addIssue({ code: 'custom', message: problem });
});

const personNameSchema = z.string().trim().min(1, 'Enter your name.').max(120, 'At most 120 characters.');
export const emailSchema = z.string().trim().toLowerCase().max(254, { abort: true }).email('Enter an e-mail address.');

export const profileUpdateSchema = z.object({ name: personNameSchema });
export type ProfileUpdate = z.infer<typeof profileUpdateSchema>;

export const passwordChangeSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password.').max(200),
  newPassword: newPasswordSchema,
});
export type PasswordChange = z.infer<typeof passwordChangeSchema>;

export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

export const passwordResetSchema = z.object({ password: newPasswordSchema });
export type PasswordResetInput = z.infer<typeof passwordResetSchema>;

/** Tokens sent by e-mail: 32 random bytes in base64url (43 characters). */
export const tokenParamSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, 'Not a valid link token.'),
});

export const invitationAcceptSchema = z.object({ name: personNameSchema, password: newPasswordSchema });
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>;

export const signedInResponseSchema = z.object({ user: sessionUserSchema, csrfToken: z.string() });
