import type { Migration } from '../migrator';

/**
 * The change feed of the search indexes every server process holds in memory (server/features/search).
 *
 * Triggers on `compounds` and `condition_records` append one row to `search_changes` per inserted or
 * changed row (only the columns search reads) and send `NOTIFY rfolio_search, '<kind>:<id>'`, so every
 * writer — API, import, curation, seeders, raw SQL — is covered without each remembering to announce.
 * A notification only wakes a process; what it applies comes from the log, read by transaction id:
 * after a sync at snapshot S, every change S could not see has `xid >= pg_snapshot_xmin(S)`, so a process
 * that missed notifications (database restart, dropped connection) catches up with one indexed query.
 * Rows older than a week are pruned by the processes; one that slept longer rebuilds from scratch.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE search_changes (
      seq BIGSERIAL PRIMARY KEY,
      kind TEXT NOT NULL CHECK (kind IN ('compound', 'record')),
      subject_id INTEGER NOT NULL,
      xid XID8 NOT NULL DEFAULT pg_current_xact_id(),
      at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    CREATE INDEX search_changes_xid ON search_changes (xid);
    CREATE INDEX search_changes_at ON search_changes (at);

    CREATE FUNCTION rfolio_search_change() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      INSERT INTO search_changes (kind, subject_id) VALUES (TG_ARGV[0], NEW.id);
      PERFORM pg_notify('rfolio_search', TG_ARGV[0] || ':' || NEW.id);
      RETURN NULL;
    END $$;

    CREATE TRIGGER compounds_search_change
      AFTER INSERT OR UPDATE OF idcode, name, synonyms, classes, fingerprint ON compounds
      FOR EACH ROW EXECUTE FUNCTION rfolio_search_change('compound');
    CREATE TRIGGER condition_records_search_change
      AFTER INSERT OR UPDATE OF compound_id, status, notes, notebook_ref, outcome_reason, purity_note ON condition_records
      FOR EACH ROW EXECUTE FUNCTION rfolio_search_change('record');
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TRIGGER condition_records_search_change ON condition_records;
    DROP TRIGGER compounds_search_change ON compounds;
    DROP FUNCTION rfolio_search_change();
    DROP TABLE search_changes;
  `);
};
