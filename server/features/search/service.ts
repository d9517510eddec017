import { performance } from 'node:perf_hooks';
import type { SearchQueryParsed, SearchResponse } from '../../../shared/schemas/search';
import { conditionsFirst, presentCompoundHit, presentRecordHit } from './presenters';
import { presentRecordListItem } from '../../core/record-presenter';
import { loadListRecords } from '../../core/record-queries';
import { currentSearchIndexes } from './process-indexes';
import { findCandidates, type Candidates } from './search-candidates';
import { groupByCompound, rankRows, type RankedRow } from './search-rank';
import { browseRecordIds, matchingRows } from './search-rows';

/** Conditions shown per compound in the compounds view. */
const CONDITIONS_PER_COMPOUND = 3;

const elapsed = (started: number) => Math.round((performance.now() - started) * 10) / 10;

async function presented(ids: number[]) {
  const { records, photoCounts } = await loadListRecords(ids);
  return new Map(records.map((record) => [record.id, presentRecordListItem(record, photoCounts.get(record.id) ?? 0)]));
}

/** Every matching active record, scored and sorted (export uses this too). */
export async function rankedMatches(
  query: Omit<SearchQueryParsed, 'page' | 'pageSize' | 'view'>,
): Promise<{ rows: RankedRow[]; candidates: Candidates }> {
  const indexes = await currentSearchIndexes();
  const candidates = await findCandidates(indexes, query);
  const rows = await matchingRows(query, candidates, query.mode === 'substructure');
  return { rows: rankRows(rows, candidates, query.sort), candidates };
}

/**
 * `GET /api/search`: words (fuzzy, over the process's Fuse index), a structure (similar or substructure,
 * over the process's fingerprint index) and the filters (in SQL, active records only), as a page of
 * records or of compounds with the best of their conditions.
 */
export async function search(query: SearchQueryParsed): Promise<SearchResponse> {
  const started = performance.now();
  const base = { mode: query.mode, view: query.view, page: query.page, pageSize: query.pageSize };
  const offset = (query.page - 1) * query.pageSize;
  if (!query.q && query.mode === 'text' && query.view === 'records') {
    const { ids, total } = await browseRecordIds(query, query.sort, query.page, query.pageSize);
    const records = await presented(ids);
    const items = ids.flatMap((id) => {
      const record = records.get(id);
      return record
        ? [
            {
              kind: 'record' as const,
              recordId: id,
              compoundId: record.compound.id,
              similarity: null,
              relevance: null,
              record,
            },
          ]
        : [];
    });
    return { ...base, items, total, truncated: false, structureSmiles: null, tookMs: elapsed(started) };
  }
  const { rows, candidates } = await rankedMatches(query);
  const structureSmiles = candidates.structure?.query.smiles ?? null;
  const truncated = candidates.structure?.truncated ?? false;
  if (query.view === 'records') {
    const page = rows.slice(offset, offset + query.pageSize);
    const records = await presented(page.map((row) => row.id));
    const items = page.flatMap((row) => {
      const record = records.get(row.id);
      return record ? [presentRecordHit(row, record)] : [];
    });
    return { ...base, items, total: rows.length, truncated, structureSmiles, tookMs: elapsed(started) };
  }
  const groups = groupByCompound(rows);
  const page = groups
    .slice(offset, offset + query.pageSize)
    .map((group) => ({ group, shown: conditionsFirst(group, CONDITIONS_PER_COMPOUND) }));
  const records = await presented(page.flatMap(({ shown }) => shown.map((row) => row.id)));
  const items = page.flatMap(({ group, shown }) => {
    const loaded = shown.flatMap((row) => records.get(row.id) ?? []);
    return loaded.length ? [presentCompoundHit(group, loaded)] : [];
  });
  return { ...base, items, total: groups.length, truncated, structureSmiles, tookMs: elapsed(started) };
}
