import type { Migration } from '../migrator';

/**
 * Imports of a group's history. `imports` keeps who, when, which file (SHA-256, bytes in stored_blobs),
 * the header mapping, how far the import got (rows processed, last committed row, batches) and the counts;
 * accepted + rejected + duplicates = processed, always. `import_rows` keeps each rejected row's original
 * cells and the reason, for the rejected-rows download. Records an import added carry its id.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE imports (
      id SERIAL PRIMARY KEY,
      user_id INTEGER NOT NULL REFERENCES users(id),
      file_name TEXT NOT NULL,
      file_sha256 TEXT NOT NULL,
      file_blob_key TEXT NOT NULL REFERENCES stored_blobs(key),
      byte_size INTEGER NOT NULL CHECK (byte_size >= 0),
      format TEXT NOT NULL CHECK (format IN ('csv', 'sdf', 'open-tlc')),
      delimiter TEXT,
      headers JSONB NOT NULL DEFAULT '[]'::jsonb,
      mapping JSONB NOT NULL DEFAULT '{}'::jsonb,
      status TEXT NOT NULL DEFAULT 'running' CHECK (status IN ('running', 'completed', 'failed', 'undone')),
      total INTEGER NOT NULL DEFAULT 0,
      blank_rows INTEGER NOT NULL DEFAULT 0,
      processed INTEGER NOT NULL DEFAULT 0,
      accepted INTEGER NOT NULL DEFAULT 0,
      rejected INTEGER NOT NULL DEFAULT 0,
      duplicates INTEGER NOT NULL DEFAULT 0,
      new_compounds INTEGER NOT NULL DEFAULT 0,
      batch_size INTEGER NOT NULL CHECK (batch_size > 0),
      batches_committed INTEGER NOT NULL DEFAULT 0,
      last_committed_row INTEGER NOT NULL DEFAULT 0,
      error TEXT,
      heartbeat_at TIMESTAMPTZ,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      updated_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      finished_at TIMESTAMPTZ,
      undone_at TIMESTAMPTZ,
      undone_by INTEGER REFERENCES users(id),
      retired_records INTEGER,
      CHECK (accepted + rejected + duplicates = processed),
      CHECK (processed = last_committed_row),
      CHECK (processed <= total)
    );
    CREATE INDEX imports_created ON imports (created_at DESC);
    CREATE INDEX imports_sha256 ON imports (file_sha256);

    CREATE TABLE import_rows (
      id BIGSERIAL PRIMARY KEY,
      import_id INTEGER NOT NULL REFERENCES imports(id),
      row_number INTEGER NOT NULL,
      line INTEGER NOT NULL,
      cells JSONB NOT NULL,
      reason TEXT NOT NULL,
      UNIQUE (import_id, row_number)
    );

    ALTER TABLE condition_records ADD CONSTRAINT condition_records_import_fk FOREIGN KEY (import_id) REFERENCES imports(id);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE condition_records DROP CONSTRAINT condition_records_import_fk;
    DROP TABLE import_rows;
    DROP TABLE imports;
  `);
};
