import { z } from 'zod';

/** Personal API tokens: `rfo_` then 43 base64url characters (32 random bytes). Only a SHA-256 hash is stored. */
export const API_TOKEN_PATTERN = /^rfo_[A-Za-z0-9_-]{43}$/;

/** At most this many usable (not revoked, not expired) tokens per person. */
export const MAX_ACTIVE_TOKENS = 25;

const futureInstant = z.union([z.iso.date(), z.iso.datetime({ offset: true })]).meta({
  description:
    'Expiry: a date (the token ends at the close of that day, UTC) or an ISO 8601 date-time; at most 5 years ahead.',
});

export const tokenCreateSchema = z.object({
  name: z.string().trim().min(1, 'Name the token (what script or tool uses it).').max(80, 'At most 80 characters.'),
  expiresAt: futureInstant.nullish(),
  readOnly: z.boolean().default(false).meta({ description: 'A read-only token may only read (GET and HEAD).' }),
});
export type TokenCreate = z.input<typeof tokenCreateSchema>;

const tokenStatusSchema = z.enum(['active', 'expired', 'revoked']);

export const apiTokenSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  prefix: z.string().meta({ description: 'The first characters of the secret, to recognise the token.' }),
  readOnly: z.boolean(),
  status: tokenStatusSchema,
  createdAt: z.string(),
  lastUsedAt: z.string().nullable(),
  expiresAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  owner: z.object({ id: z.number().int(), name: z.string(), email: z.string() }),
});
export type ApiToken = z.infer<typeof apiTokenSchema>;

export const apiTokenListSchema = z.object({ items: z.array(apiTokenSchema) });

export const createdTokenSchema = apiTokenSchema.extend({
  token: z.string().meta({ description: 'The secret, shown this once: send it as `Authorization: Bearer <token>`.' }),
});
export type CreatedToken = z.infer<typeof createdTokenSchema>;
