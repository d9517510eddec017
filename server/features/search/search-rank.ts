import type { SearchSort } from '../../../shared/schemas/search';
import { fingerprintFromBytes } from '../../core/compound-fingerprints';
import type { Candidates } from './search-candidates';
import type { SearchRow } from './search-rows';
import { tanimoto } from './structure-query';

/** A matching record with its scores: Tanimoto similarity (structure) and relevance 1 − Fuse score (text). */
export interface RankedRow extends SearchRow {
  similarity: number | null;
  relevance: number | null;
}

function similarityOf(candidates: Candidates): (row: SearchRow) => number | null {
  const structure = candidates.structure;
  if (!structure) return () => null;
  const computed = new Map<number, number>();
  return (row) => {
    const known = structure.similarity.get(row.compoundId) ?? computed.get(row.compoundId);
    if (known !== undefined) return known;
    if (!row.fingerprint) return null;
    const value = tanimoto(structure.query.fingerprint, fingerprintFromBytes(row.fingerprint));
    computed.set(row.compoundId, value);
    return value;
  };
}

function relevanceOf(candidates: Candidates): (row: SearchRow) => number | null {
  const text = candidates.text;
  if (!text) return () => null;
  return (row) => {
    const score = Math.min(text.compounds.get(row.compoundId) ?? 1, text.records.get(row.id) ?? 1);
    return Math.max(0, Math.min(1, 1 - score));
  };
}

const newestFirst = (a: RankedRow, b: RankedRow) => b.createdAt.getTime() - a.createdAt.getTime() || b.id - a.id;

const comparators: Record<Exclude<SearchSort, 'relevance'>, (a: RankedRow, b: RankedRow) => number> = {
  newest: newestFirst,
  oldest: (a, b) => a.createdAt.getTime() - b.createdAt.getTime() || a.id - b.id,
  compound: (a, b) => a.compoundKey.localeCompare(b.compoundKey) || newestFirst(a, b),
  rf: (a, b) => (a.targetRf ?? 2) - (b.targetRf ?? 2) || newestFirst(a, b),
};

/**
 * Scores and sorts matching records. "relevance" means: most similar first for a structure search
 * (substructure hits by their Tanimoto similarity to the query, so the closest analogues lead), best
 * text match next, newest last.
 */
export function rankRows(rows: SearchRow[], candidates: Candidates, sort: SearchSort): RankedRow[] {
  const similarity = similarityOf(candidates);
  const relevance = relevanceOf(candidates);
  const ranked = rows.map((row) => ({ ...row, similarity: similarity(row), relevance: relevance(row) }));
  const compare =
    sort === 'relevance'
      ? (a: RankedRow, b: RankedRow) =>
          (b.similarity ?? 0) - (a.similarity ?? 0) || (b.relevance ?? 0) - (a.relevance ?? 0) || newestFirst(a, b)
      : comparators[sort];
  return ranked.sort(compare);
}

/** Rows grouped by compound, in the order of each compound's best-ranked record. */
export function groupByCompound(rows: RankedRow[]): RankedRow[][] {
  const groups = new Map<number, RankedRow[]>();
  for (const row of rows) {
    const group = groups.get(row.compoundId);
    if (group) group.push(row);
    else groups.set(row.compoundId, [row]);
  }
  return [...groups.values()];
}
