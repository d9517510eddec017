import type { Molecule } from 'openchemlib';
import { searchGraphOf } from './fingerprint-worker.mjs';
import { popcount32 } from './similarity-index';

/**
 * A second structure descriptor beside OpenChemLib's 512 substructure keys (getIndex), which are blind to
 * where groups sit: 2-, 3- and 4-bromopyridine share every key and scored Tanimoto 1.00 against each other.
 * Atom pairs (Carhart, Smith & Venkataraghavan, J. Chem. Inf. Comput. Sci. 1985, 25, 64–73; from memory) record
 * every two heavy atoms with their types and the number of bonds between them, so the Br…N distance of 2, 3 or 4
 * bonds tells the isomers apart. Atom type: element, aromatic or not, heavy neighbours (OpenChemLib's graph, read
 * from the search graph the index already keeps); distances above 12 bonds count as 12. Each (type, type,
 * distance) present sets one bit of 1,024 (hashed, folded), so the comparison is a popcount like the first one.
 */

const MAX_DISTANCE = 12;

/** Words of the folded atom-pair fingerprint (1,024 bits). */
const ATOM_PAIR_WORDS = 32;

/** Folded atom-pair fingerprint of a search graph (server/chem/fingerprint-worker.mjs: searchGraphOf); ~n² steps. */
export function atomPairBitsOfGraph(graph: Uint8Array): Int32Array {
  const n = graph[0];
  if (!n) return new Int32Array(ATOM_PAIR_WORDS);
  const types = new Uint32Array(n);
  const start = new Uint16Array(n);
  const degree = new Uint8Array(n);
  for (let a = 0; a < n; a++) {
    const base = 1 + 6 * a;
    degree[a] = graph[base + 3];
    start[a] = graph[base + 4] | (graph[base + 5] << 8);
    types[a] = (graph[base] << 5) | ((graph[base + 2] & 1) << 4) | Math.min(degree[a], 15);
  }
  const bits = new Int32Array(ATOM_PAIR_WORDS);
  const distance = new Int16Array(n);
  const queue = new Uint16Array(n);
  for (let a = 0; a < n; a++) {
    distance.fill(-1);
    distance[a] = 0;
    let head = 0;
    let tail = 0;
    queue[tail++] = a;
    while (head < tail) {
      const atom = queue[head++];
      for (let i = 0; i < degree[atom]; i++) {
        const next = graph[start[atom] + 2 * i];
        if (distance[next] >= 0) continue;
        distance[next] = distance[atom] + 1;
        queue[tail++] = next;
      }
    }
    for (let b = a + 1; b < n; b++) {
      const d = distance[b] < 0 ? MAX_DISTANCE + 1 : Math.min(distance[b], MAX_DISTANCE);
      const low = types[a] <= types[b] ? types[a] : types[b];
      const high = types[a] <= types[b] ? types[b] : types[a];
      const key = (Math.imul(Math.imul(low, 0x9e3779b1) ^ high, 0x85ebca6b) ^ Math.imul(d + 1, 0x27d4eb2f)) >>> 0;
      const bit = (key ^ (key >>> 15)) & (ATOM_PAIR_WORDS * 32 - 1);
      bits[bit >>> 5] |= 1 << (bit & 31);
    }
  }
  return bits;
}

/** Atom-pair fingerprint of a molecule (its search graph first). */
export const atomPairBitsOfMolecule = (mol: Molecule): Int32Array => atomPairBitsOfGraph(searchGraphOf(mol));

/** Tanimoto coefficient of two atom-pair fingerprints. */
export function atomPairTanimoto(a: Int32Array, b: Int32Array): number {
  let common = 0;
  let union = 0;
  for (let w = 0; w < ATOM_PAIR_WORDS; w++) {
    common += popcount32(a[w] & b[w]);
    union += popcount32(a[w] | b[w]);
  }
  return union === 0 ? 0 : common / union;
}

/** The highest similarity a compound other than the query itself can score. */
const notIdenticalCeiling = 0.99;

/**
 * The similarity shown and ranked by: 1 only for the identical compound (same canonical identity, the ID code);
 * otherwise the mean of the substructure-key Tanimoto and the atom-pair Tanimoto (fusing two similarity
 * measures by their mean: Ginn, Willett & Bradshaw, Perspect. Drug Discov. Des. 2000, 20, 1–16; from memory),
 * at most 0.99 — stereoisomers share both descriptors and are still not the same compound.
 */
export function fusedSimilarity(keysTanimoto: number, pairsTanimoto: number | null, identical: boolean): number {
  if (identical) return 1;
  const fused = pairsTanimoto === null ? keysTanimoto : (keysTanimoto + pairsTanimoto) / 2;
  return Math.min(notIdenticalCeiling, fused);
}
