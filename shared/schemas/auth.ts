import { z } from 'zod';

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
  email: z.string().trim().toLowerCase().email('Enter an e-mail address.'),
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

export const meResponseSchema = z.object({ user: sessionUserSchema.nullable() });
