import type { Migration } from '../migrator';

/**
 * Bookmarks: a user's favourite record or compound (exactly one of the two), with an optional note.
 * One bookmark per user and record, and per user and compound. A merge moves record bookmarks to the
 * survivor (uniting a user's two into one) and an unmerge moves them back (see features/curation).
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE bookmarks (
      id SERIAL PRIMARY KEY,
      user_id INTEGER NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      record_id INTEGER REFERENCES condition_records(id),
      compound_id INTEGER REFERENCES compounds(id),
      note TEXT,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      updated_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      CHECK ((record_id IS NULL) <> (compound_id IS NULL))
    );
    CREATE UNIQUE INDEX bookmarks_user_record ON bookmarks (user_id, record_id) WHERE record_id IS NOT NULL;
    CREATE UNIQUE INDEX bookmarks_user_compound ON bookmarks (user_id, compound_id) WHERE compound_id IS NOT NULL;
    CREATE INDEX bookmarks_record ON bookmarks (record_id) WHERE record_id IS NOT NULL;
    CREATE INDEX bookmarks_compound ON bookmarks (compound_id) WHERE compound_id IS NOT NULL;
    CREATE INDEX bookmarks_user_created ON bookmarks (user_id, created_at DESC);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE bookmarks;');
};
