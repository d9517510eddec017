import Fuse from 'fuse.js';

/** Lower-cased words (letters and digits) of a text, accents removed. */
export function tokenize(text: string): string[] {
  return text
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean);
}

const bigramsOf = (token: string) => {
  const grams = new Set<string>();
  for (let i = 0; i + 2 <= token.length; i++) grams.add(token.slice(i, i + 2));
  return grams;
};

/**
 * Fuse's Bitap threshold for one query word: exact (or inside a longer word) up to 3 letters, then about one
 * wrong letter in four, so a swapped pair of letters ("benzly") still finds a six-letter word.
 */
const thresholdFor = (length: number) => (length <= 3 ? 0 : length <= 5 ? 0.25 : 0.34);

/**
 * The distinct words of a collection, with a bigram index over them, matched fuzzily with fuse.js. A query
 * word is compared only with words sharing enough letter pairs with it (q-gram lemma: a word within e
 * substitutions of the query keeps at least n − 2e of its n bigrams), so the cost follows the number of
 * plausible words, not the size of the collection.
 */
export class TokenVocabulary {
  private counts = new Map<string, number>();
  private byBigram = new Map<string, Set<string>>();

  add(token: string): void {
    const count = this.counts.get(token) ?? 0;
    this.counts.set(token, count + 1);
    if (count > 0) return;
    for (const gram of bigramsOf(token)) {
      const set = this.byBigram.get(gram) ?? new Set<string>();
      set.add(token);
      this.byBigram.set(gram, set);
    }
  }

  remove(token: string): void {
    const count = this.counts.get(token) ?? 0;
    if (count > 1) {
      this.counts.set(token, count - 1);
      return;
    }
    this.counts.delete(token);
    for (const gram of bigramsOf(token)) this.byBigram.get(gram)?.delete(token);
  }

  /** Words of the vocabulary matching a query word, with Fuse scores (0 best). */
  match(word: string): Map<string, number> {
    const threshold = thresholdFor(word.length);
    const candidates =
      word.length < 2
        ? [...this.counts.keys()].filter((token) => token.startsWith(word))
        : this.candidates(word, threshold);
    const found = new Map<string, number>();
    if (candidates.length === 0) return found;
    const fuse = new Fuse(candidates, { includeScore: true, ignoreLocation: true, threshold, isCaseSensitive: true });
    for (const hit of fuse.search(word)) found.set(hit.item, hit.score ?? 0);
    return found;
  }

  private candidates(word: string, threshold: number): string[] {
    const grams = bigramsOf(word);
    const errors = Math.floor(threshold * word.length);
    const needed = Math.max(1, grams.size - 2 * errors);
    const shared = new Map<string, number>();
    for (const gram of grams)
      for (const token of this.byBigram.get(gram) ?? []) shared.set(token, (shared.get(token) ?? 0) + 1);
    return [...shared].filter(([, count]) => count >= needed).map(([token]) => token);
  }
}
