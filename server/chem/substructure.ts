import { Molecule, SSSearcher } from 'openchemlib';
import { fingerprintOf, searchGraphOf } from './fingerprint-worker.mjs';
import { compileQuery, GraphMatcher, type QueryGraph } from './graph-match';
import type { FingerprintIndex } from './similarity-index';

/** A substructure query, prepared once: OpenChemLib fragment, its fingerprint and fast graph. */
export interface SubstructureQuery {
  fragment: Molecule;
  fingerprint: Int32Array;
  /** Null when the query is not plain (query features, lists, isotopes, explicit H): SSSearcher decides. */
  graph: QueryGraph | null;
}

/** Result of a substructure search, with how much work each stage did. */
export interface SubstructureResult {
  ids: number[];
  /** Entries left after the fingerprint pre-screen. */
  candidates: number;
  /** Candidates decided by the fast graph matcher / by OpenChemLib's SSSearcher. */
  fastChecks: number;
  searcherChecks: number;
}

function hasQueryFeatures(fragment: Molecule): boolean {
  if (fragment.getAllAtoms() !== fragment.getAtoms()) return true;
  for (let a = 0; a < fragment.getAllAtoms(); a++) {
    if (fragment.getAtomList(a) !== null || Object.values(fragment.getAtomQueryFeaturesObject(a)).some(Boolean))
      return true;
  }
  for (let b = 0; b < fragment.getAllBonds(); b++) if (fragment.getBondQueryFeatures(b) !== 0) return true;
  return false;
}

/**
 * Prepares a query: a copy flagged as fragment (open valences match anything, hydrogens and stereo
 * are not required), its fingerprint for the pre-screen (fragment mode, so it never excludes a true
 * match) and its compiled graph for the fast matcher. ~10 ms (the fingerprint).
 */
export function prepareSubstructureQuery(mol: Molecule): SubstructureQuery {
  const fragment = mol.getCompactCopy();
  fragment.setFragment(true);
  fragment.ensureHelperArrays(Molecule.cHelperRings);
  const graph = hasQueryFeatures(fragment) ? null : compileQuery(searchGraphOf(fragment));
  return { fragment, fingerprint: fingerprintOf(fragment), graph };
}

/**
 * Exact substructure search over the entries of a FingerprintIndex: pre-screen on fingerprint bits,
 * then, for plain queries on entries with a search graph, the fast graph matcher (graph-match.ts,
 * SSSearcher's rules re-implemented on compact typed arrays); otherwise OpenChemLib's SSSearcher on
 * molecules decoded from ID codes on demand and kept in an LRU cache (a parsed OpenChemLib molecule
 * takes ~14 kB, too much to keep 100k of them).
 */
export class SubstructureIndex {
  private idcodes = new Map<number, string>();
  private graphs = new Map<number, Uint8Array>();
  private cache = new Map<number, Molecule>();
  private searcher = new SSSearcher();

  constructor(
    private readonly fingerprints: FingerprintIndex,
    private readonly cacheSize = 5000,
  ) {}

  /** Registers an entry (its fingerprint lives in the FingerprintIndex). Without graph, SSSearcher decides. */
  upsert(id: number, idcode: string, graph?: Uint8Array): void {
    this.idcodes.set(id, idcode);
    if (graph && graph[0] > 0) this.graphs.set(id, graph);
    else this.graphs.delete(id);
    this.cache.delete(id);
  }

  remove(id: number): void {
    this.idcodes.delete(id);
    this.graphs.delete(id);
    this.cache.delete(id);
  }

  /** Ids of entries containing the query, in index order; stops after `limit` hits when given. */
  search(query: SubstructureQuery, limit = Number.POSITIVE_INFINITY): SubstructureResult {
    const candidates = this.fingerprints.screen(query.fingerprint);
    const matcher = query.graph ? new GraphMatcher(query.graph) : null;
    this.searcher.setFragment(query.fragment);
    const result: SubstructureResult = { ids: [], candidates: candidates.length, fastChecks: 0, searcherChecks: 0 };
    for (const id of candidates) {
      if (result.ids.length >= limit) break;
      const graph = this.graphs.get(id);
      if (matcher && graph) {
        result.fastChecks++;
        if (matcher.matches(graph)) result.ids.push(id);
        continue;
      }
      const mol = this.molecule(id);
      if (!mol) continue;
      result.searcherChecks++;
      this.searcher.setMolecule(mol);
      if (this.searcher.isFragmentInMolecule()) result.ids.push(id);
    }
    return result;
  }

  private molecule(id: number): Molecule | undefined {
    const cached = this.cache.get(id);
    if (cached) {
      this.cache.delete(id);
      this.cache.set(id, cached);
      return cached;
    }
    const idcode = this.idcodes.get(id);
    if (!idcode) return undefined;
    const mol = Molecule.fromIDCode(idcode, false);
    this.cache.set(id, mol);
    if (this.cache.size > this.cacheSize) this.cache.delete(this.cache.keys().next().value as number);
    return mol;
  }
}
