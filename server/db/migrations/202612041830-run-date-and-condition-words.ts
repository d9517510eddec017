import type { Migration } from '../migrator';

/**
 * 1. `run_on`: the day the plate was run, as the chemist gives it (a calendar date, no time of day); null for
 *    records entered before it was asked. It is not the day the record was typed in (`created_at`).
 * 2. Word search reads a record's solvents and stains too (server/features/search/index-rows.ts), so a change
 *    of the eluent, or of anything the content hash covers (spots, visualisations), announces the record to
 *    the search indexes like a change of its notes does.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE condition_records ADD COLUMN run_on DATE;
    DROP TRIGGER condition_records_search_change ON condition_records;
    CREATE TRIGGER condition_records_search_change
      AFTER INSERT OR UPDATE OF compound_id, status, notes, notebook_ref, outcome_reason, purity_note, eluent,
        content_hash ON condition_records
      FOR EACH ROW EXECUTE FUNCTION rfolio_search_change('record');
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TRIGGER condition_records_search_change ON condition_records;
    CREATE TRIGGER condition_records_search_change
      AFTER INSERT OR UPDATE OF compound_id, status, notes, notebook_ref, outcome_reason, purity_note ON condition_records
      FOR EACH ROW EXECUTE FUNCTION rfolio_search_change('record');
    ALTER TABLE condition_records DROP COLUMN run_on;
  `);
};
