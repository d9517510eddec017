import type { Molecule } from 'openchemlib';
import { fingerprintOf, searchGraphOf } from './fingerprint-worker.mjs';
import { atomPairBitsOfGraph, atomPairTanimoto, fusedSimilarity } from './fingerprint-atom-pairs';
import { FingerprintIndex, type SimilarityHit } from './similarity-index';
import { prepareSubstructureQuery, SubstructureIndex, type SubstructureResult } from './substructure';

/** What the index needs of a stored compound. */
export interface SearchEntry {
  id: number;
  idcode: string;
  /** The stored fingerprint (16 int32), as computed by the worker pool; never recomputed here. */
  fingerprint: ArrayLike<number>;
  /** Search graph from searchKeysForIdcodes; optional (without it SSSearcher checks the entry). */
  graph?: Uint8Array;
}

/** A similarity query: its fingerprint, and for the re-ranking its parent's ID code and search graph. */
export interface SimilarityQuery {
  fingerprint: ArrayLike<number>;
  idcode?: string;
  graph?: Uint8Array;
}

/**
 * The in-memory search index a server process holds: similarity (Tanimoto top-k) and exact
 * substructure search over all compounds. Build it at start from stored fingerprints (`load`),
 * then keep it current with `upsert` and `remove` on every write. Queries are parsed molecules
 * (parseStructure), so the same input checks apply as for storing.
 */
export class StructureSearchIndex {
  readonly fingerprints: FingerprintIndex;
  private substructures: SubstructureIndex;
  /** ID code and search graph of each entry (shared references), for the identity and atom-pair re-ranking. */
  private entries = new Map<number, { idcode: string; graph?: Uint8Array }>();

  constructor(capacity = 1024) {
    this.fingerprints = new FingerprintIndex(capacity);
    this.substructures = new SubstructureIndex(this.fingerprints);
  }

  get size(): number {
    return this.fingerprints.size;
  }

  /** Adds or replaces one compound. */
  upsert(entry: SearchEntry): void {
    this.fingerprints.upsert(entry.id, entry.fingerprint);
    this.substructures.upsert(entry.id, entry.idcode, entry.graph);
    this.entries.set(entry.id, {
      idcode: entry.idcode,
      graph: entry.graph && entry.graph[0] > 0 ? entry.graph : undefined,
    });
  }

  /** Adds many compounds (the rebuild at start). */
  load(entries: Iterable<SearchEntry>): void {
    for (const entry of entries) this.upsert(entry);
  }

  /** Attaches a search graph to an existing entry later (e.g. computed in the background after start). */
  attachGraph(id: number, idcode: string, graph: Uint8Array): void {
    if (!this.fingerprints.has(id)) return;
    this.substructures.upsert(id, idcode, graph);
    this.entries.set(id, { idcode, graph: graph[0] > 0 ? graph : undefined });
  }

  remove(id: number): boolean {
    this.substructures.remove(id);
    this.entries.delete(id);
    return this.fingerprints.remove(id);
  }

  /**
   * The compounds most similar to a molecule, best first: the `limit` best by Tanimoto on OpenChemLib
   * fingerprints (one popcount pass), re-ranked by the similarity shown (fingerprint-atom-pairs.ts: 1 only for
   * the same ID code, else the mean with the atom-pair Tanimoto, at most 0.99) when the query's ID code and search
   * graph are known — always for a Molecule. Pass the stored fingerprint as `fingerprint` to skip computing it (~9 ms).
   */
  similar(query: Molecule | SimilarityQuery, options: { limit?: number; threshold?: number } = {}): SimilarityHit[] {
    const read: SimilarityQuery =
      'fingerprint' in query
        ? query
        : { fingerprint: fingerprintOf(query), idcode: query.getIDCode(), graph: searchGraphOf(query) };
    const threshold = options.threshold ?? 0;
    const hits = this.fingerprints.topK(read.fingerprint, options.limit ?? 50, threshold);
    if (!read.graph || read.idcode === undefined) return hits;
    const pairs = atomPairBitsOfGraph(read.graph);
    return hits
      .map((hit) => {
        const entry = this.entries.get(hit.id);
        const other = entry?.graph ? atomPairTanimoto(pairs, atomPairBitsOfGraph(entry.graph)) : null;
        return { id: hit.id, similarity: fusedSimilarity(hit.similarity, other, entry?.idcode === read.idcode) };
      })
      .filter((hit) => hit.similarity >= threshold)
      .sort((a, b) => b.similarity - a.similarity);
  }

  /** Compounds containing the query as a substructure (stereo and hydrogen counts not required). */
  substructure(query: Molecule, options: { limit?: number } = {}): SubstructureResult {
    return this.substructures.search(prepareSubstructureQuery(query), options.limit);
  }
}
