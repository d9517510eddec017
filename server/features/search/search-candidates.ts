import type { SearchMode } from '../../../shared/schemas/search';
import type { SearchIndexes } from './search-indexes';
import { readStructureQuery, type StructureQuery } from './structure-query';
import type { TextHits } from './text-index';

/**
 * What the in-memory indexes found before the database applies the filters. Absent parts did not
 * constrain the search (no words, or no structure).
 */
export interface Candidates {
  /** Compounds found by structure, with their Tanimoto similarity to the query when known. */
  structure?: { compoundIds: number[]; similarity: Map<number, number>; truncated: boolean; query: StructureQuery };
  /** Compounds and records matching the words (Fuse score, 0 best). */
  text?: { compounds: TextHits; records: TextHits };
}

interface CandidateInput {
  mode: SearchMode;
  q?: string;
  structure?: string;
  threshold: number;
  limit: number;
}

/**
 * Runs the structure and text parts of a search on the process's indexes. Similarity: the `limit` best
 * compounds at or above `threshold` (one pass of popcounts over the stored fingerprints). Substructure:
 * the fingerprint pre-screen, then exact matching of the survivors, stopping after `limit` matches so the
 * work stays bounded (`truncated` then says so).
 */
export async function findCandidates(indexes: SearchIndexes, input: CandidateInput): Promise<Candidates> {
  const candidates: Candidates = {};
  if (input.mode !== 'text' && input.structure) {
    const query = await readStructureQuery(input.structure);
    if (input.mode === 'similar') {
      const hits = indexes.structures.similar(
        { fingerprint: query.fingerprint, idcode: query.idcode, graph: query.graph },
        { limit: input.limit, threshold: input.threshold },
      );
      candidates.structure = {
        compoundIds: hits.map((hit) => hit.id),
        similarity: new Map(hits.map((hit) => [hit.id, hit.similarity])),
        truncated: hits.length >= input.limit,
        query,
      };
    } else {
      const found = indexes.structures.substructure(query.input, { limit: input.limit });
      candidates.structure = {
        compoundIds: found.ids,
        similarity: new Map(),
        truncated: found.ids.length >= input.limit,
        query,
      };
    }
  }
  if (input.q) candidates.text = indexes.text.search(input.q);
  return candidates;
}
