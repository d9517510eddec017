/**
 * Fast exact subgraph matching on the compact search graphs of fingerprint-worker.mjs, following
 * OpenChemLib's SSSearcher rules for a plain fragment in its default match mode (SSSearcher.java:
 * areAtomsSimilar, areBondsSimilar, getAtomQueryDefaults, getBondQueryDefaults):
 * - atoms: same element; at least as many heavy neighbours as the query atom; an aromatic query atom
 *   needs an aromatic atom (a non-aromatic one matches either); a charged query atom needs the same
 *   charge (an uncharged one matches any); hydrogen counts are not compared;
 * - bonds: see BOND_ALLOWED (a plain single/double bond matches that order, also in a non-delocalised
 *   aromatic ring such as pyrrole's, never a delocalised benzene bond; a delocalised bond only a
 *   delocalised one; an aromatic double bond also a delocalised one);
 * - ring and pi-electron requirements follow from the mapped bonds themselves.
 * "Plain" means no query features, atom lists, isotopes, radicals or explicit hydrogens in the query
 * (compileQuery returns null otherwise and the caller uses SSSearcher). Checked against SSSearcher
 * in tests/server/chem/substructure.test.ts.
 */

const AROMATIC = 1;
const LIST_OR_PSEUDO = 2;
const ISOTOPE_OR_RADICAL = 4;
const UNCHARGED = 128;

/** Bit set of target bond codes each query bond code accepts (codes as in fingerprint-worker.mjs). */
const BOND_ALLOWED = Uint8Array.from([
  0,
  (1 << 1) | (1 << 5),
  (1 << 2) | (1 << 6),
  1 << 3,
  1 << 4,
  1 << 5,
  (1 << 6) | (1 << 4),
]);

/** A query compiled for matching: atoms in visiting order, each with the earlier atoms it bonds to. */
export interface QueryGraph {
  size: number;
  /** Per visiting position: query atom properties. */
  atomicNo: Uint8Array;
  charge: Uint8Array;
  aromatic: Uint8Array;
  degree: Uint8Array;
  /** Per visiting position: position of an earlier bonded atom to walk from, or −1 (new component). */
  from: Int16Array;
  /** Per visiting position: [start, end) into backPositions/backCodes, the bonds to earlier atoms. */
  backStart: Uint16Array;
  backPositions: Uint16Array;
  backCodes: Uint8Array;
}

function adjacencyStart(graph: Uint8Array, atom: number): number {
  return graph[5 + 6 * atom] | (graph[6 + 6 * atom] << 8);
}

/**
 * Compiles an encoded query graph; returns null when the query is not plain (lists, pseudo atoms,
 * isotopes, radicals, other bond types) — the caller then uses SSSearcher.
 */
export function compileQuery(graph: Uint8Array): QueryGraph | null {
  const n = graph[0];
  if (n === 0) return null;
  const order: number[] = [];
  const position = new Int16Array(n).fill(-1);
  const from: number[] = [];
  const rank = (a: number) => (graph[1 + 6 * a] === 6 ? 0 : 100) + graph[4 + 6 * a];
  while (order.length < n) {
    let root = -1;
    for (let a = 0; a < n; a++) if (position[a] < 0 && (root < 0 || rank(a) > rank(root))) root = a;
    position[root] = order.length;
    order.push(root);
    from.push(-1);
    for (let k = order.length - 1; k < order.length; k++) {
      const atom = order[k];
      const start = adjacencyStart(graph, atom);
      for (let i = 0; i < graph[4 + 6 * atom]; i++) {
        const next = graph[start + 2 * i];
        if (position[next] >= 0) continue;
        position[next] = order.length;
        order.push(next);
        from.push(k);
      }
    }
  }
  const backStart = new Uint16Array(n + 1);
  const positions: number[] = [];
  const codes: number[] = [];
  for (let k = 0; k < n; k++) {
    const atom = order[k];
    const base = 1 + 6 * atom;
    if (graph[base + 2] & (LIST_OR_PSEUDO | ISOTOPE_OR_RADICAL)) return null;
    backStart[k] = positions.length;
    const start = adjacencyStart(graph, atom);
    for (let i = 0; i < graph[base + 3]; i++) {
      const code = graph[start + 2 * i + 1];
      if (code === 0) return null;
      const other = position[graph[start + 2 * i]];
      if (other < k) {
        positions.push(other);
        codes.push(code);
      }
    }
  }
  backStart[n] = positions.length;
  const pick = (offset: number) => Uint8Array.from(order, (atom) => graph[1 + 6 * atom + offset]);
  return {
    size: n,
    atomicNo: pick(0),
    charge: pick(1),
    aromatic: pick(2).map((flags) => flags & AROMATIC),
    degree: pick(3),
    from: Int16Array.from(from),
    backStart,
    backPositions: Uint16Array.from(positions),
    backCodes: Uint8Array.from(codes),
  };
}

/** Reusable matcher: allocate once, call `matches` for many molecules with one query. */
export class GraphMatcher {
  private mapped = new Int16Array(256);
  private used = new Uint8Array(256);
  private query: QueryGraph;
  private target: Uint8Array = new Uint8Array(1);

  constructor(query: QueryGraph) {
    this.query = query;
  }

  /** True when the query maps injectively onto the target graph (SSSearcher's isFragmentInMolecule). */
  matches(target: Uint8Array): boolean {
    const n = target[0];
    if (n < this.query.size) return false;
    this.target = target;
    this.used.fill(0, 0, n);
    return this.extend(0);
  }

  private compatible(k: number, atom: number): boolean {
    const q = this.query;
    const t = this.target;
    const base = 1 + 6 * atom;
    if (this.used[atom] || t[base] !== q.atomicNo[k] || t[base + 3] < q.degree[k]) return false;
    if (q.charge[k] !== UNCHARGED && t[base + 1] !== q.charge[k]) return false;
    const flags = t[base + 2];
    if (flags & LIST_OR_PSEUDO || (q.aromatic[k] && !(flags & AROMATIC))) return false;
    for (let b = q.backStart[k]; b < q.backStart[k + 1]; b++) {
      const code = this.bondCode(atom, this.mapped[q.backPositions[b]]);
      if (code < 0 || !(BOND_ALLOWED[q.backCodes[b]] & (1 << code))) return false;
    }
    return true;
  }

  private bondCode(atom: number, other: number): number {
    const t = this.target;
    const start = adjacencyStart(t, atom);
    for (let i = 0; i < t[4 + 6 * atom]; i++) if (t[start + 2 * i] === other) return t[start + 2 * i + 1];
    return -1;
  }

  private tryAtom(k: number, atom: number): boolean {
    if (!this.compatible(k, atom)) return false;
    this.mapped[k] = atom;
    this.used[atom] = 1;
    if (this.extend(k + 1)) return true;
    this.used[atom] = 0;
    return false;
  }

  private extend(k: number): boolean {
    if (k === this.query.size) return true;
    const t = this.target;
    const from = this.query.from[k];
    if (from < 0) {
      for (let atom = 0; atom < t[0]; atom++) if (this.tryAtom(k, atom)) return true;
      return false;
    }
    const anchor = this.mapped[from];
    const start = adjacencyStart(t, anchor);
    for (let i = 0; i < t[4 + 6 * anchor]; i++) if (this.tryAtom(k, t[start + 2 * i])) return true;
    return false;
  }
}
