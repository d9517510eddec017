import type { Migration } from '../migrator';

/** Invitations and password resets (tokens stored as SHA-256 hashes only) and the shared sign-in throttle counters. */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE invitations (
      id SERIAL PRIMARY KEY,
      email TEXT NOT NULL,
      role TEXT NOT NULL CHECK (role IN ('viewer', 'member', 'curator', 'admin')),
      token_hash TEXT NOT NULL UNIQUE,
      invited_by INTEGER REFERENCES users(id) ON DELETE SET NULL,
      expires_at TIMESTAMPTZ NOT NULL,
      sent_count INTEGER NOT NULL DEFAULT 1,
      last_sent_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      accepted_at TIMESTAMPTZ,
      accepted_user_id INTEGER REFERENCES users(id) ON DELETE SET NULL,
      revoked_at TIMESTAMPTZ,
      revoked_by INTEGER REFERENCES users(id) ON DELETE SET NULL,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      updated_at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    -- At most one open invitation per address (open = neither accepted nor revoked; an expired one is resent).
    CREATE UNIQUE INDEX invitations_open_email ON invitations (lower(email)) WHERE accepted_at IS NULL AND revoked_at IS NULL;

    CREATE TABLE password_resets (
      id SERIAL PRIMARY KEY,
      user_id INTEGER NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      token_hash TEXT NOT NULL UNIQUE,
      expires_at TIMESTAMPTZ NOT NULL,
      used_at TIMESTAMPTZ,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    CREATE INDEX password_resets_user ON password_resets (user_id) WHERE used_at IS NULL;

    CREATE TABLE rate_limit_hits (
      key TEXT PRIMARY KEY,
      hits INTEGER NOT NULL,
      reset_at TIMESTAMPTZ NOT NULL
    );
    CREATE INDEX rate_limit_hits_reset ON rate_limit_hits (reset_at);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE rate_limit_hits; DROP TABLE password_resets; DROP TABLE invitations;');
};
