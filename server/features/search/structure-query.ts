import type { Molecule } from 'openchemlib';
import { parentOf, parseStructure } from '../../chem';
import { searchGraphMolecule } from '../../chem/fingerprint';
import { popcount32 } from '../../chem/similarity-index';
import { Compound } from '../../db/models';
import { fingerprintOfIdcode } from '../../core/compound-fingerprints';

/** A structure query read once: what similarity and substructure search need of it. */
export interface StructureQuery {
  /** The whole input as drawn or pasted (the substructure query; see server/chem/analyse.ts). */
  input: Molecule;
  /** Fingerprint of the neutral parent, computed exactly as stored fingerprints are (from its ID code). */
  fingerprint: Int32Array;
  /** Isomeric SMILES of the parent, for the answer (so the page can show what was understood). */
  smiles: string;
  /** The parent's ID code and search graph: similarity is 1 only for the same ID code, and re-ranked with atom pairs. */
  idcode: string;
  graph: Uint8Array;
}

const CACHE_SIZE = 1024;
const cache = new Map<string, Promise<StructureQuery>>();

/**
 * Parses a SMILES or molfile query with the chemistry engine (bad input → its 400/413/422; ~3 ms). The
 * parent's fingerprint is the stored compound's when the query is a known compound (one indexed read gives
 * the very value computing would), else it is computed (~11 ms) in the chemistry engine's worker threads, so
 * other requests go on meanwhile. Memoised by text (LRU of 1024): pages of one search, and every search again
 * after a write, reuse it.
 */
export async function readStructureQuery(text: string): Promise<StructureQuery> {
  // A molfile's first lines may be blank (name, program), so only single-line input (SMILES) is trimmed.
  const key = text.includes('\n') ? text.trimEnd() : text.trim();
  const hit = cache.get(key);
  if (hit) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const input = parseStructure(key).molecule;
  const { parent } = parentOf(input);
  const smiles = parent.toIsomericSmiles();
  const idcode = parent.getIDCode();
  const query = Compound.findOne({ where: { idcode }, attributes: ['fingerprint'] })
    .then((stored) => fingerprintOfIdcode(idcode, stored?.fingerprint))
    .then((fingerprint): StructureQuery => ({
      input,
      fingerprint,
      smiles,
      idcode,
      graph: searchGraphMolecule(parent),
    }));
  cache.set(key, query);
  query.catch(() => {
    if (cache.get(key) === query) cache.delete(key);
  });
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  return query;
}

/** Tanimoto coefficient of two 16-word fingerprints: common bits / (bits of a + bits of b − common) (Willett 1998). */
export function tanimoto(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let common = 0;
  let total = 0;
  for (let w = 0; w < a.length; w++) {
    common += popcount32(a[w] & b[w]);
    total += popcount32(a[w]) + popcount32(b[w]);
  }
  const union = total - common;
  return union === 0 ? 0 : common / union;
}
