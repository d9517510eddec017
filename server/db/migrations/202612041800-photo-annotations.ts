import type { Migration } from '../migrator';
import { watchContentTable } from './202612030100-content-version';

/**
 * Plate annotations: the plates, lines, lanes and spots a chemist confirmed on a record photo (the overlay editor),
 * as JSON, one row a revision (append-only; the newest is the current one), with who saved it and when.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE photo_annotations (
      id SERIAL PRIMARY KEY,
      photo_id INTEGER NOT NULL REFERENCES record_photos(id) ON DELETE CASCADE,
      revision INTEGER NOT NULL CHECK (revision >= 1),
      annotation JSONB NOT NULL,
      saved_by INTEGER REFERENCES users(id) ON DELETE SET NULL,
      saved_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      UNIQUE (photo_id, revision)
    );
  `);
  await watchContentTable(qi, 'photo_annotations');
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE photo_annotations;');
};
