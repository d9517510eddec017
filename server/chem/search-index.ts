import type { Molecule } from 'openchemlib';
import { fingerprintOf } from './fingerprint-worker.mjs';
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

/**
 * The in-memory search index a server process holds: similarity (Tanimoto top-k) and exact
 * substructure search over all compounds. Build it at start from stored fingerprints (`load`),
 * then keep it current with `upsert` and `remove` on every write. Queries are parsed molecules
 * (parseStructure), so the same input checks apply as for storing.
 */
export class StructureSearchIndex {
  readonly fingerprints: FingerprintIndex;
  private substructures: SubstructureIndex;

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
  }

  /** Adds many compounds (the rebuild at start). */
  load(entries: Iterable<SearchEntry>): void {
    for (const entry of entries) this.upsert(entry);
  }

  /** Attaches a search graph to an existing entry later (e.g. computed in the background after start). */
  attachGraph(id: number, idcode: string, graph: Uint8Array): void {
    if (this.fingerprints.has(id)) this.substructures.upsert(id, idcode, graph);
  }

  remove(id: number): boolean {
    this.substructures.remove(id);
    return this.fingerprints.remove(id);
  }

  /**
   * The compounds most similar to a molecule (Tanimoto on OpenChemLib fingerprints), best first.
   * Pass the molecule's stored fingerprint as `fingerprint` to skip computing it (~9 ms).
   */
  similar(query: Molecule | { fingerprint: ArrayLike<number> }, options: { limit?: number; threshold?: number } = {}): SimilarityHit[] {
    const fingerprint = 'fingerprint' in query ? query.fingerprint : fingerprintOf(query);
    return this.fingerprints.topK(fingerprint, options.limit ?? 50, options.threshold ?? 0);
  }

  /** Compounds containing the query as a substructure (stereo and hydrogen counts not required). */
  substructure(query: Molecule, options: { limit?: number } = {}): SubstructureResult {
    return this.substructures.search(prepareSubstructureQuery(query), options.limit);
  }
}
