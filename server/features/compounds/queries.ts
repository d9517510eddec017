import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { Compound } from '../../db/models';
import { NotFoundError } from '../../http/errors';
import type { z } from 'zod';
import type { CompoundListItem, compoundListQuerySchema } from '../../../shared/schemas/compound';

type Query = z.output<typeof compoundListQuerySchema>;

const sortSql: Record<Query['sort'], string> = {
  name: 'lower(coalesce(c.name, c.canonical_smiles))',
  createdAt: 'c.created_at',
  mw: 'c.mw',
  records: 'record_count',
};

interface CompoundRow {
  id: number;
  name: string | null;
  synonyms: string[];
  canonical_smiles: string;
  formula: string;
  mw: number;
  classes: string[];
  record_count: string;
  created_at: Date;
}

const present = (row: CompoundRow): CompoundListItem => ({
  id: row.id,
  name: row.name,
  synonyms: row.synonyms,
  canonicalSmiles: row.canonical_smiles,
  formula: row.formula,
  mw: row.mw,
  classes: row.classes,
  recordCount: Number(row.record_count),
  createdAt: new Date(row.created_at).toISOString(),
});

/** One page of compounds with how many active records each has; filters by text (name, synonym, SMILES, formula) and class. */
export async function listCompounds(query: Query) {
  const conditions: string[] = [];
  const replacements: Record<string, unknown> = {};
  if (query.q) {
    conditions.push(
      "(c.name ILIKE :q OR array_to_string(c.synonyms, ' ') ILIKE :q OR c.canonical_smiles = :exact OR upper(c.formula) = upper(:exact))",
    );
    replacements.q = `%${query.q.replace(/[\\%_]/g, (char) => `\\${char}`)}%`;
    replacements.exact = query.q;
  }
  if (query.class) {
    conditions.push(':className = ANY(c.classes)');
    replacements.className = query.class;
  }
  const where = conditions.length > 0 ? conditions.join(' AND ') : 'TRUE';
  const counts = "(SELECT count(*) FROM condition_records r WHERE r.compound_id = c.id AND r.status = 'active')";
  const [{ total }] = await sequelize.query<{ total: string }>(
    `SELECT count(*) AS total FROM compounds c WHERE ${where}`,
    { replacements, type: QueryTypes.SELECT },
  );
  const rows = await sequelize.query<CompoundRow>(
    `SELECT c.id, c.name, c.synonyms, c.canonical_smiles, c.formula, c.mw, c.classes, c.created_at, ${counts} AS record_count
     FROM compounds c WHERE ${where}
     ORDER BY ${sortSql[query.sort]} ${query.order === 'asc' ? 'ASC' : 'DESC'} NULLS LAST, c.id ASC LIMIT :limit OFFSET :offset`,
    {
      replacements: { ...replacements, limit: query.pageSize, offset: (query.page - 1) * query.pageSize },
      type: QueryTypes.SELECT,
    },
  );
  return { items: rows.map(present), total: Number(total), page: query.page, pageSize: query.pageSize };
}

export async function findCompound(id: number): Promise<Compound> {
  const compound = await Compound.findByPk(id);
  if (!compound) throw new NotFoundError('Compound');
  return compound;
}

/** Ids of a compound's active records, newest first. */
export async function activeRecordIdsOf(compoundId: number): Promise<number[]> {
  const rows = await sequelize.query<{ id: number }>(
    "SELECT id FROM condition_records WHERE compound_id = :compoundId AND status = 'active' ORDER BY created_at DESC, id DESC",
    { replacements: { compoundId }, type: QueryTypes.SELECT },
  );
  return rows.map((row) => row.id);
}
