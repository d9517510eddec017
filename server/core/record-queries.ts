import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';
import { RecordContributor, RecordPhoto } from '../db/models';
import { NotFoundError } from '../http/errors';
import type { RecordListQueryParsed } from '../../shared/schemas/record';
import type { ExportRecord, FullRecord, LoadedRecord } from './record-presenter';
import { recordFilterSql } from './record-filters';
import { listRowsSql, nest, selectColumns } from './record-rows-sql';

/** A record with everything its page shows; 404 when there is none with this id. */
export async function loadFullRecord(id: number): Promise<FullRecord> {
  const [{ records }, photos, contributors] = await Promise.all([
    loadListRecords([id]),
    sequelize.query<FullRecord['photos'][number]>(
      `SELECT ${selectColumns(RecordPhoto, 'p')}, u.id AS "uploader.id", u.name AS "uploader.name"
       FROM record_photos p LEFT JOIN users u ON u.id = p.uploaded_by WHERE p.record_id = :id ORDER BY p.id`,
      { replacements: { id }, type: QueryTypes.SELECT },
    ),
    sequelize.query<FullRecord['contributors'][number]>(
      `SELECT ${selectColumns(RecordContributor, 'rc')}, u.id AS "user.id", u.name AS "user.name"
       FROM record_contributors rc JOIN users u ON u.id = rc.user_id WHERE rc.record_id = :id ORDER BY rc.id`,
      { replacements: { id }, type: QueryTypes.SELECT },
    ),
  ]);
  if (records.length === 0) throw new NotFoundError('Record');
  return { ...records[0], photos: photos.map(nest), contributors: contributors.map(nest) } as FullRecord;
}

const rowsSql = { list: listRowsSql(false), export: listRowsSql(true) };

/**
 * Records by id, in the order given, with what a list row shows, and their photo counts: one query of plain
 * rows (core/record-rows-sql.ts) rather than model instances joined row by row. `withMolfile` adds the
 * compound's molfile (SD export).
 */
export async function loadListRecords<M extends boolean = false>(
  ids: number[],
  options: { withMolfile?: M } = {},
): Promise<{ records: (M extends true ? ExportRecord : LoadedRecord)[]; photoCounts: Map<number, number> }> {
  type Loaded = (M extends true ? ExportRecord : LoadedRecord) & { photoCount: number };
  if (ids.length === 0) return { records: [], photoCounts: new Map() };
  const sql = options.withMolfile ? rowsSql.export : rowsSql.list;
  const rows = await sequelize.query<Record<string, unknown>>(sql, { replacements: { ids }, type: QueryTypes.SELECT });
  const byId = new Map(rows.map((row) => [row.id as number, nest(row) as Loaded]));
  const records = ids.map((id) => byId.get(id)).filter((row): row is Loaded => row !== undefined);
  return { records, photoCounts: new Map(records.map((record) => [record.id, record.photoCount])) };
}

const sortSql: Record<RecordListQueryParsed['sort'], string> = {
  createdAt: 'r.created_at',
  updatedAt: 'r.updated_at',
  compound: 'lower(coalesce(c.name, c.canonical_smiles))',
  technique: 'r.technique',
  phase: 'r.stationary_phase',
  strongPercent: 'r.strong_percent',
  targetRf: 'r.target_rf',
  outcome: "array_position(ARRAY['clean','partial','failed'], r.outcome)",
  yieldPercent: 'r.yield_percent',
  author: 'lower(u.name)',
};

/** One page of record ids matching the filters, sorted on the server, with the total count (one query; a second only past the end). */
export async function listRecordIds(query: RecordListQueryParsed): Promise<{ ids: number[]; total: number }> {
  const { where, replacements } = recordFilterSql(query);
  const from = 'FROM condition_records r JOIN compounds c ON c.id = r.compound_id JOIN users u ON u.id = r.author_id';
  const direction = query.order === 'asc' ? 'ASC' : 'DESC';
  const rows = await sequelize.query<{ id: number; total: string }>(
    `SELECT r.id, count(*) OVER () AS total ${from} WHERE ${where} ORDER BY ${sortSql[query.sort]} ` +
      `${direction} NULLS LAST, r.id ${direction} LIMIT :limit OFFSET :offset`,
    {
      replacements: { ...replacements, limit: query.pageSize, offset: (query.page - 1) * query.pageSize },
      type: QueryTypes.SELECT,
    },
  );
  if (rows.length > 0) return { ids: rows.map((row) => row.id), total: Number(rows[0].total) };
  const [{ total }] = await sequelize.query<{ total: string }>(`SELECT count(*) AS total ${from} WHERE ${where}`, {
    replacements,
    type: QueryTypes.SELECT,
  });
  return { ids: [], total: Number(total) };
}
