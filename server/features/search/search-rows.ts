import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import type { z } from 'zod';
import type { searchFiltersSchema, SearchSort } from '../../../shared/schemas/search';
import type { outcomes } from '../../../shared/schemas/record-parts';
import { recordFilterSql } from '../../core/record-filters';
import type { Candidates } from './search-candidates';

export type SearchFilters = z.output<typeof searchFiltersSchema>;

/** A matching active record, as light as sorting and grouping need. */
export interface SearchRow {
  id: number;
  compoundId: number;
  createdAt: Date;
  targetRf: number | null;
  outcome: (typeof outcomes)[number];
  compoundKey: string;
  fingerprint: Buffer | null;
}

const FROM = 'FROM condition_records r JOIN compounds c ON c.id = r.compound_id JOIN users u ON u.id = r.author_id';

/** The records filters (server/core/record-filters.ts) for active records only. */
function filterSql(filters: SearchFilters) {
  return recordFilterSql({
    status: 'active',
    class: filters.class,
    phase: filters.phase,
    solvent: filters.solvent,
    stain: filters.stain,
    outcome: filters.outcome,
    technique: filters.technique,
    author: filters.contributor,
    from: filters.from,
    to: filters.to,
  });
}

/** SQL limiting rows to what the indexes found; null when nothing can match. */
function candidateSql(candidates: Candidates, replacements: Record<string, unknown>): string | null {
  const parts: string[] = [];
  if (candidates.structure) {
    if (candidates.structure.compoundIds.length === 0) return null;
    parts.push('r.compound_id IN (:structureIds)');
    replacements.structureIds = candidates.structure.compoundIds;
  }
  if (candidates.text) {
    const compounds = [...candidates.text.compounds.keys()];
    const records = [...candidates.text.records.keys()];
    if (compounds.length === 0 && records.length === 0) return null;
    const either = [];
    if (compounds.length) either.push('r.compound_id IN (:textCompounds)');
    if (records.length) either.push('r.id IN (:textRecords)');
    parts.push(`(${either.join(' OR ')})`);
    Object.assign(replacements, { textCompounds: compounds, textRecords: records });
  }
  return parts.length ? parts.join(' AND ') : 'TRUE';
}

/** Every active record passing the filters and the indexes' candidates (light rows, unsorted). */
export async function matchingRows(
  filters: SearchFilters,
  candidates: Candidates,
  withFingerprints: boolean,
): Promise<SearchRow[]> {
  const { where, replacements } = filterSql(filters);
  const limitTo = candidateSql(candidates, replacements);
  if (limitTo === null) return [];
  const rows = await sequelize.query<Omit<SearchRow, 'fingerprint'> & { fingerprint?: Buffer | null }>(
    `SELECT r.id, r.compound_id AS "compoundId", r.created_at AS "createdAt", r.target_rf AS "targetRf", r.outcome,
            lower(coalesce(c.name, c.canonical_smiles)) AS "compoundKey" ${withFingerprints ? ', c.fingerprint' : ''}
     ${FROM} WHERE ${where} AND ${limitTo}`,
    { replacements, type: QueryTypes.SELECT },
  );
  return rows.map((row) => ({ ...row, fingerprint: row.fingerprint ?? null }));
}

const sortSql: Record<SearchSort, string> = {
  relevance: 'r.created_at DESC',
  newest: 'r.created_at DESC',
  oldest: 'r.created_at ASC',
  compound: 'lower(coalesce(c.name, c.canonical_smiles)) ASC',
  rf: 'r.target_rf ASC NULLS LAST',
};

/** One page of record ids when neither words nor a structure narrow the search (sorted and paged in SQL). */
export async function browseRecordIds(filters: SearchFilters, sort: SearchSort, page: number, pageSize: number) {
  const { where, replacements } = filterSql(filters);
  const [{ total }] = await sequelize.query<{ total: string }>(`SELECT count(*) AS total ${FROM} WHERE ${where}`, {
    replacements,
    type: QueryTypes.SELECT,
  });
  const rows = await sequelize.query<{ id: number }>(
    `SELECT r.id ${FROM} WHERE ${where} ORDER BY ${sortSql[sort]}, r.id DESC LIMIT :limit OFFSET :offset`,
    {
      replacements: { ...replacements, limit: pageSize, offset: (page - 1) * pageSize },
      type: QueryTypes.SELECT,
    },
  );
  return { ids: rows.map((row) => row.id), total: Number(total) };
}
