import type { QueryInterface } from 'sequelize';
import type { Migration } from '../migrator';

/**
 * A version number of the group's content, kept by the database itself: `data_versions.version` (row
 * `content`) goes up by one in every transaction that changes a content table, at its commit, through
 * triggers — so the API, imports, curation, seeders and raw SQL are all covered. Answers computed from
 * content (records, search, Scout) are reused for as long as it stays the same (db/data-stamp.ts).
 *
 * Content is every table except those no shared answer reads: sign-in sessions, throttle counters,
 * bookmarks (each user's own, never in a shared answer), invitations, password resets, the audit log,
 * the search change feed (written only beside content changes, and pruned) and the migrations table.
 * A sign-in's update of `users.last_sign_in_at` alone is not a content change either.
 *
 * Why it is safe: the bump is a deferred constraint trigger, so it runs as the transaction commits and
 * becomes visible atomically with the data. A reader that reads the version before its data can only see
 * data as new as the version or newer, never older; a newer version later makes it compute again. The
 * version row is locked only from the bump to the commit, so writers barely wait on each other. One bump
 * per transaction (a transaction-local flag), however many rows it writes.
 */
export const NOT_CONTENT = [
  'sessions',
  'rate_limit_hits',
  'bookmarks',
  'invitations',
  'password_resets',
  'audit_log',
  'search_changes',
  'schema_migrations',
  'data_versions',
  'api_tokens',
];

const usersOnlySignedIn =
  `(to_jsonb(OLD) - 'last_sign_in_at' - 'updated_at') IS DISTINCT FROM ` +
  `(to_jsonb(NEW) - 'last_sign_in_at' - 'updated_at')`;

/** Adds the content triggers to a table (a later migration creating a content table calls this for it). */
export async function watchContentTable(qi: QueryInterface, tablename: string): Promise<void> {
  const table = `"${tablename}"`;
  const statements =
    tablename === 'users'
      ? [
          `CREATE CONSTRAINT TRIGGER content_changed AFTER INSERT OR DELETE ON ${table} DEFERRABLE ` +
            `INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION rfolio_content_changed()`,
          `CREATE CONSTRAINT TRIGGER content_changed_update AFTER UPDATE ON ${table} DEFERRABLE ` +
            `INITIALLY DEFERRED FOR EACH ROW WHEN (${usersOnlySignedIn}) EXECUTE FUNCTION rfolio_content_changed()`,
        ]
      : [
          `CREATE CONSTRAINT TRIGGER content_changed AFTER INSERT OR UPDATE OR DELETE ON ${table} ` +
            `DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION rfolio_content_changed()`,
        ];
  statements.push(
    `CREATE TRIGGER content_truncated AFTER TRUNCATE ON ${table} FOR EACH STATEMENT EXECUTE FUNCTION rfolio_content_changed()`,
  );
  for (const statement of statements) await qi.sequelize.query(statement);
}

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE data_versions (name TEXT PRIMARY KEY, version BIGINT NOT NULL);
    INSERT INTO data_versions (name, version) VALUES ('content', 1);

    CREATE FUNCTION rfolio_content_changed() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF current_setting('rfolio.content_bumped', true) IS DISTINCT FROM pg_current_xact_id()::text THEN
        PERFORM set_config('rfolio.content_bumped', pg_current_xact_id()::text, true);
        UPDATE data_versions SET version = version + 1 WHERE name = 'content';
      END IF;
      RETURN NULL;
    END $$;
  `);
  const [rows] = await qi.sequelize.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = current_schema() AND tablename NOT IN (:excluded) ORDER BY tablename`,
    { replacements: { excluded: NOT_CONTENT } },
  );
  for (const { tablename } of rows as { tablename: string }[]) await watchContentTable(qi, tablename);
};

export const down: Migration = async ({ context: qi }) => {
  const [rows] = await qi.sequelize.query(
    `SELECT DISTINCT c.relname AS tablename FROM pg_trigger t JOIN pg_class c ON c.oid = t.tgrelid ` +
      `WHERE t.tgname IN ('content_changed', 'content_changed_update', 'content_truncated')`,
  );
  for (const { tablename } of rows as { tablename: string }[]) {
    for (const trigger of ['content_changed', 'content_changed_update', 'content_truncated']) {
      await qi.sequelize.query(`DROP TRIGGER IF EXISTS ${trigger} ON "${tablename}"`);
    }
  }
  await qi.sequelize.query(`DROP FUNCTION rfolio_content_changed(); DROP TABLE data_versions;`);
};
