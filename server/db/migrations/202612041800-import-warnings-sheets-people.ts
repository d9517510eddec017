import type { Migration } from '../migrator';

/**
 * Imports that keep whole rows: row warnings beside rejections (import_rows.kind), the sheet and header row a
 * workbook or titled CSV was read from, the day/month order chosen for its dates, and on each record the
 * person a sheet named when no member matched ("recorded by") and the raw texts of fields the import only
 * partly recognised (source_texts: { phase, stain, date, person, … } as written).
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE imports DROP CONSTRAINT IF EXISTS imports_format_check;
    ALTER TABLE imports ADD CONSTRAINT imports_format_check CHECK (format IN ('csv', 'sdf', 'open-tlc', 'xlsx'));
    ALTER TABLE import_rows ADD COLUMN kind TEXT NOT NULL DEFAULT 'rejected' CHECK (kind IN ('rejected', 'warning'));
    CREATE INDEX import_rows_import_kind ON import_rows (import_id, kind, row_number);
    ALTER TABLE imports ADD COLUMN warned INTEGER NOT NULL DEFAULT 0;
    ALTER TABLE imports ADD COLUMN sheet TEXT;
    ALTER TABLE imports ADD COLUMN header_row INTEGER;
    ALTER TABLE imports ADD COLUMN date_order TEXT CHECK (date_order IN ('dmy', 'mdy'));
    ALTER TABLE condition_records ADD COLUMN recorded_by TEXT;
    ALTER TABLE condition_records ADD COLUMN source_texts JSONB;
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE condition_records DROP COLUMN source_texts;
    ALTER TABLE condition_records DROP COLUMN recorded_by;
    ALTER TABLE imports DROP COLUMN date_order;
    ALTER TABLE imports DROP COLUMN header_row;
    ALTER TABLE imports DROP COLUMN sheet;
    ALTER TABLE imports DROP COLUMN warned;
    DROP INDEX import_rows_import_kind;
    ALTER TABLE import_rows DROP COLUMN kind;
    UPDATE imports SET format = 'csv' WHERE format = 'xlsx';
    ALTER TABLE imports DROP CONSTRAINT imports_format_check;
    ALTER TABLE imports ADD CONSTRAINT imports_format_check CHECK (format IN ('csv', 'sdf', 'open-tlc'));
  `);
};
