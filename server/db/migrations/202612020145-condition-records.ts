import type { Migration } from '../migrator';

/**
 * Condition records and everything hanging from them. Rows are never hard-deleted by the app:
 * records are retired or merged (status), photos are marked removed. `origin_record_id` on spots,
 * visualisations and photos names the record a row was first contributed to, so a merge can move
 * rows to the survivor and an unmerge can move them back.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE stored_blobs (
      key TEXT PRIMARY KEY,
      bytes BYTEA NOT NULL,
      content_type TEXT NOT NULL,
      byte_size INTEGER NOT NULL,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now()
    );

    CREATE TABLE condition_records (
      id SERIAL PRIMARY KEY,
      compound_id INTEGER NOT NULL REFERENCES compounds(id),
      author_id INTEGER NOT NULL REFERENCES users(id),
      technique TEXT NOT NULL CHECK (technique IN ('tlc', 'flash', 'prep_tlc')),
      stationary_phase TEXT NOT NULL,
      stationary_phase_other TEXT,
      eluent JSONB NOT NULL,
      solvent_keys TEXT[] NOT NULL DEFAULT '{}',
      additive_keys TEXT[] NOT NULL DEFAULT '{}',
      eluent_mode TEXT NOT NULL DEFAULT 'isocratic' CHECK (eluent_mode IN ('isocratic', 'gradient')),
      strong_percent DOUBLE PRECISION,
      target_rf DOUBLE PRECISION CHECK (target_rf IS NULL OR (target_rf > 0 AND target_rf <= 1)),
      outcome TEXT NOT NULL CHECK (outcome IN ('clean', 'partial', 'failed')),
      outcome_reason TEXT,
      column_diameter_mm DOUBLE PRECISION CHECK (column_diameter_mm IS NULL OR column_diameter_mm > 0),
      cartridge_size TEXT,
      silica_g DOUBLE PRECISION CHECK (silica_g IS NULL OR silica_g > 0),
      sample_mg DOUBLE PRECISION CHECK (sample_mg IS NULL OR sample_mg > 0),
      load_method TEXT CHECK (load_method IS NULL OR load_method IN ('dry', 'liquid')),
      fraction_ml DOUBLE PRECISION CHECK (fraction_ml IS NULL OR fraction_ml > 0),
      fractions_pooled TEXT,
      yield_percent DOUBLE PRECISION CHECK (yield_percent IS NULL OR (yield_percent >= 0 AND yield_percent <= 100)),
      purity_note TEXT,
      notebook_ref TEXT,
      notes TEXT,
      status TEXT NOT NULL DEFAULT 'active' CHECK (status IN ('active', 'merged', 'retired')),
      merged_into_id INTEGER REFERENCES condition_records(id),
      retired_reason TEXT,
      retired_at TIMESTAMPTZ,
      retired_by INTEGER REFERENCES users(id),
      import_id INTEGER,
      content_hash TEXT NOT NULL,
      demo BOOLEAN NOT NULL DEFAULT false,
      revision INTEGER NOT NULL DEFAULT 1,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      updated_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      CHECK (status <> 'merged' OR merged_into_id IS NOT NULL)
    );
    CREATE INDEX condition_records_compound ON condition_records (compound_id);
    CREATE INDEX condition_records_author ON condition_records (author_id);
    CREATE INDEX condition_records_status_created ON condition_records (status, created_at DESC);
    CREATE INDEX condition_records_phase ON condition_records (stationary_phase);
    CREATE INDEX condition_records_technique ON condition_records (technique);
    CREATE INDEX condition_records_outcome ON condition_records (outcome);
    CREATE INDEX condition_records_solvents ON condition_records USING GIN (solvent_keys);
    CREATE INDEX condition_records_target_rf ON condition_records (target_rf);
    CREATE INDEX condition_records_content_hash ON condition_records (content_hash);
    CREATE INDEX condition_records_import ON condition_records (import_id) WHERE import_id IS NOT NULL;
    CREATE INDEX condition_records_merged_into ON condition_records (merged_into_id) WHERE merged_into_id IS NOT NULL;

    CREATE TABLE record_spots (
      id SERIAL PRIMARY KEY,
      record_id INTEGER NOT NULL REFERENCES condition_records(id),
      origin_record_id INTEGER NOT NULL REFERENCES condition_records(id),
      position INTEGER NOT NULL DEFAULT 0,
      role TEXT NOT NULL CHECK (role IN ('target', 'starting_material', 'by_product', 'unknown')),
      rf DOUBLE PRECISION NOT NULL CHECK (rf > 0 AND rf <= 1),
      lane TEXT CHECK (lane IS NULL OR lane IN ('starting_material', 'co_spot', 'mixture')),
      spot_distance_mm DOUBLE PRECISION,
      front_distance_mm DOUBLE PRECISION,
      label TEXT,
      CHECK ((spot_distance_mm IS NULL) = (front_distance_mm IS NULL)),
      CHECK (spot_distance_mm IS NULL OR (spot_distance_mm > 0 AND spot_distance_mm <= front_distance_mm))
    );
    CREATE INDEX record_spots_record ON record_spots (record_id, position);

    CREATE TABLE record_visualisations (
      id SERIAL PRIMARY KEY,
      record_id INTEGER NOT NULL REFERENCES condition_records(id),
      origin_record_id INTEGER NOT NULL REFERENCES condition_records(id),
      position INTEGER NOT NULL DEFAULT 0,
      method TEXT NOT NULL,
      note TEXT
    );
    CREATE INDEX record_visualisations_record ON record_visualisations (record_id, position);
    CREATE INDEX record_visualisations_method ON record_visualisations (method, record_id);

    CREATE TABLE record_photos (
      id SERIAL PRIMARY KEY,
      record_id INTEGER NOT NULL REFERENCES condition_records(id),
      origin_record_id INTEGER NOT NULL REFERENCES condition_records(id),
      uploaded_by INTEGER NOT NULL REFERENCES users(id),
      blob_key TEXT NOT NULL REFERENCES stored_blobs(key),
      thumb_key TEXT NOT NULL REFERENCES stored_blobs(key),
      content_type TEXT NOT NULL CHECK (content_type IN ('image/jpeg', 'image/png', 'image/webp')),
      byte_size INTEGER NOT NULL,
      width INTEGER NOT NULL,
      height INTEGER NOT NULL,
      sha256 TEXT NOT NULL,
      original_name TEXT,
      caption TEXT,
      removed_at TIMESTAMPTZ,
      removed_by INTEGER REFERENCES users(id),
      created_at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    CREATE INDEX record_photos_record ON record_photos (record_id) WHERE removed_at IS NULL;

    CREATE TABLE record_revisions (
      id BIGSERIAL PRIMARY KEY,
      record_id INTEGER NOT NULL REFERENCES condition_records(id),
      number INTEGER NOT NULL,
      author_id INTEGER REFERENCES users(id),
      action TEXT NOT NULL,
      changes JSONB NOT NULL DEFAULT '[]'::jsonb,
      snapshot JSONB NOT NULL,
      at TIMESTAMPTZ NOT NULL DEFAULT now(),
      UNIQUE (record_id, number)
    );

    CREATE TABLE record_contributors (
      id SERIAL PRIMARY KEY,
      record_id INTEGER NOT NULL REFERENCES condition_records(id),
      user_id INTEGER NOT NULL REFERENCES users(id),
      role TEXT NOT NULL CHECK (role IN ('author', 'editor', 'merged-from')),
      via_record_id INTEGER REFERENCES condition_records(id),
      created_at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX record_contributors_unique ON record_contributors (record_id, user_id, role, COALESCE(via_record_id, 0));
    CREATE INDEX record_contributors_user ON record_contributors (user_id);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE record_contributors; DROP TABLE record_revisions; DROP TABLE record_photos;
    DROP TABLE record_visualisations; DROP TABLE record_spots; DROP TABLE condition_records; DROP TABLE stored_blobs;
  `);
};
