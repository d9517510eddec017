const WORDS = 16;

/** One similarity hit: the stored id and its Tanimoto coefficient (0–1). */
export interface SimilarityHit {
  id: number;
  similarity: number;
}

/** Bits set in a 32-bit word (SWAR popcount). */
export function popcount32(x: number): number {
  let v = x - ((x >>> 1) & 0x55555555);
  v = (v & 0x33333333) + ((v >>> 2) & 0x33333333);
  v = (v + (v >>> 4)) & 0x0f0f0f0f;
  return Math.imul(v, 0x01010101) >>> 24;
}

function toWords(fingerprint: ArrayLike<number>): Int32Array {
  if (fingerprint.length !== WORDS)
    throw new RangeError(`A fingerprint has ${WORDS} words, got ${fingerprint.length}.`);
  return Int32Array.from(fingerprint, (word) => word | 0);
}

function bitCount(words: ArrayLike<number>, offset = 0): number {
  let sum = 0;
  for (let w = 0; w < WORDS; w++) sum += popcount32(words[offset + w]);
  return sum;
}

/**
 * In-memory index of 512-bit OpenChemLib fingerprints (16 words each, all in one Int32Array)
 * keyed by integer ids. Similarity is the Tanimoto coefficient c / (a + b − c) on set bits
 * (Willett, J. Chem. Inf. Comput. Sci. 1998, 38, 983); the substructure pre-screen keeps entries
 * whose bits include every query bit. Removal swaps the last entry into the gap.
 */
export class FingerprintIndex {
  private words: Int32Array;
  private counts: Uint16Array;
  private ids: Float64Array;
  private slotOf = new Map<number, number>();
  private length = 0;

  constructor(capacity = 1024) {
    this.words = new Int32Array(capacity * WORDS);
    this.counts = new Uint16Array(capacity);
    this.ids = new Float64Array(capacity);
  }

  get size(): number {
    return this.length;
  }

  has(id: number): boolean {
    return this.slotOf.has(id);
  }

  /** Adds an entry or replaces the fingerprint of an existing id. */
  upsert(id: number, fingerprint: ArrayLike<number>): void {
    const words = toWords(fingerprint);
    let slot = this.slotOf.get(id);
    if (slot === undefined) {
      this.grow(this.length + 1);
      slot = this.length++;
      this.slotOf.set(id, slot);
      this.ids[slot] = id;
    }
    this.words.set(words, slot * WORDS);
    this.counts[slot] = bitCount(words);
  }

  /** Adds many entries at once: `packed` holds 16 words per id, in the order of `ids` (for rebuilds). */
  load(ids: ArrayLike<number>, packed: Int32Array): void {
    if (packed.length !== ids.length * WORDS) throw new RangeError('packed must hold 16 words per id.');
    for (let i = 0; i < ids.length; i++) this.upsert(ids[i], packed.subarray(i * WORDS, (i + 1) * WORDS));
  }

  /** Removes an id; returns whether it was there. */
  remove(id: number): boolean {
    const slot = this.slotOf.get(id);
    if (slot === undefined) return false;
    const last = --this.length;
    if (slot !== last) {
      this.words.copyWithin(slot * WORDS, last * WORDS, (last + 1) * WORDS);
      this.counts[slot] = this.counts[last];
      this.ids[slot] = this.ids[last];
      this.slotOf.set(this.ids[slot], slot);
    }
    this.slotOf.delete(id);
    return true;
  }

  /**
   * The k most similar entries with Tanimoto ≥ threshold, best first (ties in index order). An all-zero
   * query has no bits to compare and returns nothing. Entries whose bit counts alone bound the
   * coefficient below the current k-th best, min(a, b) / max(a, b), are skipped without changing the
   * result (Swamidass & Baldi, J. Chem. Inf. Model. 2007, 47, 302; reference from memory).
   */
  topK(query: ArrayLike<number>, k = 50, threshold = 0): SimilarityHit[] {
    const q = toWords(query);
    const qCount = bitCount(q);
    if (qCount === 0 || k <= 0) return [];
    const bestScore = new Float64Array(k);
    const bestSlot = new Int32Array(k);
    let filled = 0;
    const { words, counts } = this;
    for (let slot = 0; slot < this.length; slot++) {
      const count = counts[slot];
      const bound = count < qCount ? count / qCount : qCount / count;
      if (bound < threshold || (filled === k && bound <= bestScore[k - 1])) continue;
      const base = slot * WORDS;
      let common = 0;
      for (let w = 0; w < WORDS; w++) common += popcount32(words[base + w] & q[w]);
      const score = common / (qCount + counts[slot] - common);
      if (score < threshold || (filled === k && score <= bestScore[k - 1])) continue;
      let i = filled < k ? filled++ : k - 1;
      while (i > 0 && bestScore[i - 1] < score) {
        bestScore[i] = bestScore[i - 1];
        bestSlot[i] = bestSlot[i - 1];
        i--;
      }
      bestScore[i] = score;
      bestSlot[i] = slot;
    }
    return Array.from({ length: filled }, (_, i) => ({ id: this.ids[bestSlot[i]], similarity: bestScore[i] }));
  }

  /** Ids whose fingerprint contains every bit of the query (the substructure pre-screen). */
  screen(query: ArrayLike<number>): number[] {
    const q = toWords(query);
    const hits: number[] = [];
    const { words } = this;
    for (let slot = 0; slot < this.length; slot++) {
      const base = slot * WORDS;
      let w = 0;
      while (w < WORDS && (words[base + w] & q[w]) === q[w]) w++;
      if (w === WORDS) hits.push(this.ids[slot]);
    }
    return hits;
  }

  private grow(needed: number): void {
    if (needed <= this.ids.length) return;
    const capacity = Math.max(needed, this.ids.length * 2);
    const words = new Int32Array(capacity * WORDS);
    words.set(this.words);
    this.words = words;
    const counts = new Uint16Array(capacity);
    counts.set(this.counts);
    this.counts = counts;
    const ids = new Float64Array(capacity);
    ids.set(this.ids);
    this.ids = ids;
  }
}
