import type { Migration } from '../migrator';

/**
 * Personal API tokens for scripts. Only the SHA-256 hash of the secret is kept (the secret has 256 random bits, so
 * a plain hash suffices; a leaked table holds no usable token). Not a content table (NOT_CONTENT in
 * 202612030100-content-version): using a token updates `last_used_at`, which must not invalidate kept answers.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE api_tokens (
      id SERIAL PRIMARY KEY,
      user_id INTEGER NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      name TEXT NOT NULL CHECK (length(name) BETWEEN 1 AND 80),
      token_hash CHAR(64) NOT NULL UNIQUE,
      token_prefix TEXT NOT NULL,
      read_only BOOLEAN NOT NULL DEFAULT false,
      expires_at TIMESTAMPTZ,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      last_used_at TIMESTAMPTZ,
      revoked_at TIMESTAMPTZ,
      revoked_by INTEGER REFERENCES users(id) ON DELETE SET NULL
    );
    CREATE INDEX api_tokens_user_created ON api_tokens (user_id, created_at DESC);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE api_tokens;');
};
