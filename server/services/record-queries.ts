import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';
import { Compound, ConditionRecord, RecordContributor, RecordPhoto, RecordSpot, RecordVisualisation, User } from '../models';
import { NotFoundError } from '../errors';
import type { RecordListQueryParsed } from '../../shared/schemas/record';
import type { FullRecord, LoadedRecord } from '../presenters/records';
import { recordFilterSql } from './record-filters';

const listIncludes = [
  { model: Compound, as: 'compound' },
  { model: User, as: 'author', attributes: ['id', 'name'] },
  { model: RecordSpot, as: 'spots' },
  { model: RecordVisualisation, as: 'visualisations' },
];

/** A record with everything its page shows; 404 when there is none with this id. */
export async function loadFullRecord(id: number): Promise<FullRecord> {
  const record = await ConditionRecord.findByPk(id, {
    include: [
      ...listIncludes,
      { model: RecordPhoto, as: 'photos', include: [{ model: User, as: 'uploader', attributes: ['id', 'name'] }] },
      { model: RecordContributor, as: 'contributors', include: [{ model: User, as: 'user', attributes: ['id', 'name'] }] },
    ],
  });
  if (!record) throw new NotFoundError('Record');
  return record as FullRecord;
}

/** Records by id, in the order given, with what a list row shows, and their photo counts. */
export async function loadListRecords(ids: number[]): Promise<{ records: LoadedRecord[]; photoCounts: Map<number, number> }> {
  if (ids.length === 0) return { records: [], photoCounts: new Map() };
  const rows = (await ConditionRecord.findAll({ where: { id: ids }, include: listIncludes })) as LoadedRecord[];
  const counts = await sequelize.query<{ record_id: number; n: string }>(
    'SELECT record_id, count(*) AS n FROM record_photos WHERE record_id IN (:ids) AND removed_at IS NULL GROUP BY record_id',
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  const byId = new Map(rows.map((row) => [row.id, row]));
  return {
    records: ids.map((id) => byId.get(id)).filter((row): row is LoadedRecord => row !== undefined),
    photoCounts: new Map(counts.map((row) => [row.record_id, Number(row.n)])),
  };
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

/** One page of record ids matching the filters, sorted on the server, with the total count. */
export async function listRecordIds(query: RecordListQueryParsed): Promise<{ ids: number[]; total: number }> {
  const { where, replacements } = recordFilterSql(query);
  const from = 'FROM condition_records r JOIN compounds c ON c.id = r.compound_id JOIN users u ON u.id = r.author_id';
  const direction = query.order === 'asc' ? 'ASC' : 'DESC';
  const [{ total }] = await sequelize.query<{ total: string }>(`SELECT count(*) AS total ${from} WHERE ${where}`, {
    replacements,
    type: QueryTypes.SELECT,
  });
  const rows = await sequelize.query<{ id: number }>(
    `SELECT r.id ${from} WHERE ${where} ORDER BY ${sortSql[query.sort]} ${direction} NULLS LAST, r.id ${direction} LIMIT :limit OFFSET :offset`,
    { replacements: { ...replacements, limit: query.pageSize, offset: (query.page - 1) * query.pageSize }, type: QueryTypes.SELECT },
  );
  return { ids: rows.map((row) => row.id), total: Number(total) };
}
