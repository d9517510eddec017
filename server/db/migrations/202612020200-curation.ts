import type { Migration } from '../migrator';

/**
 * Curation: merges of condition records and dismissed duplicate candidates.
 *
 * `record_merges.before` holds a full row dump (to_jsonb) of every row a merge touches — the records,
 * their spots, visualisations, photos, contributors and bookmarks — so an unmerge restores them exactly.
 * `after_digests` is one md5 per record of its rows right after the merge: an unmerge is refused when a
 * record changed since, because restoring would silently undo that later work. `effects` lists rows the
 * merge inserted or deleted (contributor credits, de-duplicated bookmarks, revisions).
 *
 * A dismissal's `signature` is the sorted record ids with each record's revision and updated_at; a
 * candidate group is hidden only while its signature is unchanged.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE record_merges (
      id SERIAL PRIMARY KEY,
      survivor_id INTEGER NOT NULL REFERENCES condition_records(id),
      merged_ids INTEGER[] NOT NULL CHECK (cardinality(merged_ids) > 0),
      fields JSONB NOT NULL DEFAULT '{}'::jsonb,
      before JSONB NOT NULL,
      after_digests JSONB NOT NULL DEFAULT '{}'::jsonb,
      effects JSONB NOT NULL DEFAULT '{}'::jsonb,
      actor_id INTEGER NOT NULL REFERENCES users(id),
      at TIMESTAMPTZ NOT NULL DEFAULT now(),
      undone_at TIMESTAMPTZ,
      undone_by INTEGER REFERENCES users(id),
      CHECK ((undone_at IS NULL) = (undone_by IS NULL))
    );
    CREATE INDEX record_merges_survivor ON record_merges (survivor_id);
    CREATE INDEX record_merges_merged ON record_merges USING GIN (merged_ids);
    CREATE INDEX record_merges_at ON record_merges (at DESC);

    CREATE TABLE duplicate_dismissals (
      id SERIAL PRIMARY KEY,
      record_ids INTEGER[] NOT NULL CHECK (cardinality(record_ids) > 1),
      signature TEXT NOT NULL,
      reason TEXT NOT NULL,
      actor_id INTEGER NOT NULL REFERENCES users(id),
      at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    CREATE INDEX duplicate_dismissals_signature ON duplicate_dismissals (signature);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE duplicate_dismissals; DROP TABLE record_merges;');
};
