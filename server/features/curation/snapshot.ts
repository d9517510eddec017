import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import type { MergeSnapshot } from '../../db/models/record-merge';

/** Tables whose rows hang from a record through `record_id` and move or gain rows in a merge. */
export const childTables = ['record_spots', 'record_visualisations', 'record_photos', 'record_contributors'] as const;
type ChildTable = (typeof childTables)[number];
type SnapshotTable = 'condition_records' | ChildTable | 'bookmarks';

/** True once the bookmarks table (record bookmarks by `record_id`) exists in this database. */
export async function hasBookmarks(transaction?: Transaction): Promise<boolean> {
  const [row] = await sequelize.query<{ present: boolean }>(
    `SELECT EXISTS (SELECT 1 FROM information_schema.columns WHERE table_schema = current_schema()
       AND table_name = 'bookmarks' AND column_name = 'record_id') AS present`,
    { type: QueryTypes.SELECT, transaction },
  );
  return row.present;
}

async function rowsOf(table: SnapshotTable, where: string, ids: readonly number[], transaction: Transaction) {
  const rows = await sequelize.query<{ row: Record<string, unknown> }>(
    `SELECT to_jsonb(x) AS row FROM ${table} x WHERE ${where} IN (:ids) ORDER BY x.id`,
    { replacements: { ids: [...ids] }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((item) => item.row);
}

/**
 * Full row dumps (to_jsonb, every column) of the records and of every row hanging from them — spots,
 * visualisations, photos, contributors and bookmarks — as one JSON document.
 */
export async function dumpRows(ids: readonly number[], transaction: Transaction): Promise<MergeSnapshot> {
  const snapshot: MergeSnapshot = { condition_records: await rowsOf('condition_records', 'x.id', ids, transaction) };
  for (const table of childTables) snapshot[table] = await rowsOf(table, 'x.record_id', ids, transaction);
  if (await hasBookmarks(transaction)) snapshot.bookmarks = await rowsOf('bookmarks', 'x.record_id', ids, transaction);
  return snapshot;
}

const childJson = (table: ChildTable) =>
  `(SELECT coalesce(jsonb_agg(to_jsonb(x) ORDER BY x.id), '[]'::jsonb)::text FROM ${table} x WHERE x.record_id = r.id)`;

/**
 * md5 per record of its row (without the revision counter and updated_at, which history moves on) and the
 * rows of its spots, visualisations, photos and contributors. Equal digests mean nothing a merge could
 * restore has changed.
 */
export async function recordDigests(
  ids: readonly number[],
  transaction?: Transaction,
): Promise<Record<string, string>> {
  const rows = await sequelize.query<{ id: number; digest: string }>(
    `SELECT r.id, md5(concat_ws('|', (to_jsonb(r) - 'revision' - 'updated_at')::text, ${childTables.map(childJson).join(', ')})) AS digest
     FROM condition_records r WHERE r.id IN (:ids)`,
    { replacements: { ids: [...ids] }, type: QueryTypes.SELECT, transaction },
  );
  return Object.fromEntries(rows.map((row) => [String(row.id), row.digest]));
}

const quote = (column: string) => `"${column.replace(/"/g, '""')}"`;

/** Puts every column of a dumped row back (except `keep`), matching on id. */
export async function restoreRow(
  table: SnapshotTable,
  row: Record<string, unknown>,
  transaction: Transaction,
  keep: readonly string[] = [],
) {
  const columns = Object.keys(row)
    .filter((column) => column !== 'id' && !keep.includes(column))
    .map(quote)
    .join(', ');
  const [, affected] = await sequelize.query(
    `UPDATE ${table} AS t SET (${columns}) = (SELECT ${columns} FROM jsonb_populate_record(NULL::${table}, ` +
      `CAST(:row AS jsonb))) WHERE t.id = :id`,
    { replacements: { row: JSON.stringify(row), id: row.id }, type: QueryTypes.UPDATE, transaction },
  );
  return affected;
}

/** Inserts a dumped row again with its original id. */
export async function reinsertRow(table: SnapshotTable, row: Record<string, unknown>, transaction: Transaction) {
  const columns = Object.keys(row).map(quote).join(', ');
  await sequelize.query(
    `INSERT INTO ${table} (${columns}) SELECT ${columns} FROM jsonb_populate_record(NULL::${table}, ` +
      `CAST(:row AS jsonb)) ON CONFLICT DO NOTHING`,
    { replacements: { row: JSON.stringify(row) }, transaction },
  );
}
