import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { AuditEntry } from '../../db/models';
import { newApiToken } from '../../auth/bearer';
import { ConflictError, NotFoundError, ValidationError } from '../../http/errors';
import { MAX_ACTIVE_TOKENS, tokenCreateSchema, type ApiToken, type CreatedToken } from '../../../shared/schemas/tokens';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { z } from 'zod';

type TokenRow = {
  id: number;
  name: string;
  token_prefix: string;
  read_only: boolean;
  created_at: Date;
  last_used_at: Date | null;
  expires_at: Date | null;
  revoked_at: Date | null;
  user_id: number;
  owner_name: string;
  owner_email: string;
};

const SELECT = `SELECT t.id, t.name, t.token_prefix, t.read_only, t.created_at, t.last_used_at, t.expires_at,
                       t.revoked_at,
                       t.user_id, u.name AS owner_name, u.email AS owner_email
                  FROM api_tokens t JOIN users u ON u.id = t.user_id`;

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

function present(row: TokenRow): ApiToken {
  const expired = row.expires_at !== null && new Date(row.expires_at).getTime() <= Date.now();
  return {
    id: row.id,
    name: row.name,
    prefix: row.token_prefix,
    readOnly: row.read_only,
    status: row.revoked_at ? 'revoked' : expired ? 'expired' : 'active',
    createdAt: iso(row.created_at)!,
    lastUsedAt: iso(row.last_used_at),
    expiresAt: iso(row.expires_at),
    revokedAt: iso(row.revoked_at),
    owner: { id: row.user_id, name: row.owner_name, email: row.owner_email },
  };
}

const MAX_YEARS_AHEAD = 5;

/** A date alone ends at the close of that day (UTC); a date-time is taken as given. Must lie ahead, within 5 years. */
export function expiryOf(value: string | null | undefined, now = new Date()): Date | null {
  if (!value) return null;
  const at = /^\d{4}-\d{2}-\d{2}$/.test(value) ? new Date(`${value}T23:59:59.999Z`) : new Date(value);
  const latest = new Date(now);
  latest.setUTCFullYear(latest.getUTCFullYear() + MAX_YEARS_AHEAD);
  if (!(at.getTime() > now.getTime()))
    throw new ValidationError('body.expiresAt: The expiry must lie in the future.', [
      { path: 'body.expiresAt', message: 'The expiry must lie in the future.' },
    ]);
  if (at.getTime() > latest.getTime())
    throw new ValidationError(`body.expiresAt: At most ${MAX_YEARS_AHEAD} years ahead.`, [
      { path: 'body.expiresAt', message: `At most ${MAX_YEARS_AHEAD} years ahead.` },
    ]);
  return at;
}

/** Creates a token for `user`; the secret is in the answer and nowhere else (only its hash is stored). */
export async function createToken(user: SessionUser, input: z.output<typeof tokenCreateSchema>): Promise<CreatedToken> {
  const expiresAt = expiryOf(input.expiresAt);
  const { token, hash, prefix } = newApiToken();
  const id = await sequelize.transaction(async (transaction) => {
    // One person's creations are serialised, so two at once cannot both pass the limit.
    await sequelize.query('SELECT id FROM users WHERE id = :user FOR UPDATE', {
      replacements: { user: user.id },
      transaction,
    });
    const [{ count }] = await sequelize.query<{ count: number }>(
      `SELECT count(*)::int AS count FROM api_tokens
        WHERE user_id = :user AND revoked_at IS NULL AND (expires_at IS NULL OR expires_at > now())`,
      { replacements: { user: user.id }, type: QueryTypes.SELECT, transaction },
    );
    if (count >= MAX_ACTIVE_TOKENS)
      throw new ConflictError(`You have ${count} usable tokens, the most allowed; revoke one first.`);
    const [row] = await sequelize.query<{ id: number }>(
      `INSERT INTO api_tokens (user_id, name, token_hash, token_prefix, read_only, expires_at)
       VALUES (:user, :name, :hash, :prefix, :readOnly, :expiresAt) RETURNING id`,
      {
        replacements: { user: user.id, name: input.name, hash, prefix, readOnly: input.readOnly, expiresAt },
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    await AuditEntry.create(
      {
        actorId: user.id,
        action: 'api_token.create',
        subjectType: 'api_token',
        subjectId: String(row.id),
        details: { name: input.name, readOnly: input.readOnly },
      },
      { transaction },
    );
    return row.id;
  });
  return { ...(await getToken(id)), token };
}

async function getToken(id: number): Promise<ApiToken> {
  const [row] = await sequelize.query<TokenRow>(`${SELECT} WHERE t.id = :id`, {
    replacements: { id },
    type: QueryTypes.SELECT,
  });
  if (!row) throw new NotFoundError('API token');
  return present(row);
}

/** One person's tokens (or, for `userId` undefined, everyone's), newest first; revoked ones stay listed. */
export async function listTokens(userId?: number): Promise<ApiToken[]> {
  const rows = await sequelize.query<TokenRow>(
    `${SELECT} ${userId === undefined ? '' : 'WHERE t.user_id = :user'}
      ORDER BY t.created_at DESC, t.id DESC LIMIT 500`,
    { replacements: { user: userId ?? null }, type: QueryTypes.SELECT },
  );
  return rows.map(present);
}

/** Revokes a token of the caller (admins: anyone's). Someone else's token is "not found" to a non-admin. */
export async function revokeToken(actor: SessionUser, id: number): Promise<ApiToken> {
  const anyone = actor.role === 'admin';
  await sequelize.transaction(async (transaction) => {
    const [row] = await sequelize.query<{ user_id: number; revoked_at: Date | null }>(
      'SELECT user_id, revoked_at FROM api_tokens WHERE id = :id FOR UPDATE',
      { replacements: { id }, type: QueryTypes.SELECT, transaction },
    );
    if (!row || (!anyone && row.user_id !== actor.id)) throw new NotFoundError('API token');
    if (row.revoked_at) return;
    await sequelize.query('UPDATE api_tokens SET revoked_at = now(), revoked_by = :actor WHERE id = :id', {
      replacements: { id, actor: actor.id },
      transaction,
    });
    await AuditEntry.create(
      {
        actorId: actor.id,
        action: 'api_token.revoke',
        subjectType: 'api_token',
        subjectId: String(id),
        details: { owner: row.user_id },
      },
      { transaction },
    );
  });
  return getToken(id);
}
