import { z } from 'zod';
import { emailSchema, roleSchema } from './auth';

/** People and invitations as the admin pages see them. */
const userStatusSchema = z.enum(['active', 'disabled']);

export const adminUserSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  status: userStatusSchema,
  lastSignInAt: z.string().nullable(),
  createdAt: z.string(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;

export const adminUserListSchema = z.object({ items: z.array(adminUserSchema), total: z.number().int() });

export const adminUserUpdateSchema = z
  .object({ role: roleSchema.optional(), status: userStatusSchema.optional() })
  .refine((v) => v.role !== undefined || v.status !== undefined, { message: 'Send a role or a status.' });
export type AdminUserUpdate = z.infer<typeof adminUserUpdateSchema>;

const invitationStatusSchema = z.enum(['pending', 'expired', 'accepted', 'revoked']);
export type InvitationStatus = z.infer<typeof invitationStatusSchema>;

export const invitationCreateSchema = z.object({ email: emailSchema, role: roleSchema });
export type InvitationCreate = z.infer<typeof invitationCreateSchema>;

export const invitationSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  role: roleSchema,
  status: invitationStatusSchema,
  invitedBy: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  expiresAt: z.string(),
  lastSentAt: z.string(),
  sentCount: z.number().int(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

export const invitationListQuerySchema = z.object({ status: z.enum(['open', 'all']).default('open') });
export const invitationListSchema = z.object({ items: z.array(invitationSchema) });

/** What the invitee's page may know before accepting: no ids, no token. */
export const invitationPreviewSchema = z.object({
  email: z.string(),
  role: roleSchema,
  inviterName: z.string().nullable(),
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

export const resetPreviewSchema = z.object({ expiresAt: z.string() });

/** A message kept by the local mail catcher (development, demo and tests only). */
const caughtMailSchema = z.object({
  id: z.number().int(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  links: z.array(z.string()),
});
export type CaughtMail = z.infer<typeof caughtMailSchema>;
export const mailboxSchema = z.object({ items: z.array(caughtMailSchema), smtpPort: z.number().int().nullable() });
