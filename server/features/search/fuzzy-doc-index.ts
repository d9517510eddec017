import { tokenize, TokenVocabulary } from './token-vocabulary';

/** A document's text fields, each with a weight (1 = the most telling field). */
export type WeightedFields = { text: string; weight: number }[];

/** How much a match in a less telling field adds to the score (0 = as good as the best field). */
const FIELD_PENALTY = 0.1;

/**
 * Documents (by numeric id) searchable by words with typos: every query word must match a word of the
 * document (in any field) within fuse.js's Bitap threshold (TokenVocabulary). A document's score is the
 * mean over query words of its best match, plus a small penalty for matches in less telling fields;
 * 0 is a perfect match. Adding and removing a document touches only its own words.
 */
/** The documents holding one word, with the word's best field weight in each (parallel arrays: compact at 100k documents). */
interface Posting {
  ids: number[];
  weights: number[];
}

export class FuzzyDocIndex {
  private vocabulary = new TokenVocabulary();
  private postings = new Map<string, Posting>();
  private wordsOf = new Map<number, string[]>();

  get size(): number {
    return this.wordsOf.size;
  }

  set(id: number, fields: WeightedFields): void {
    this.remove(id);
    const words = new Map<string, number>();
    for (const field of fields)
      for (const word of tokenize(field.text)) words.set(word, Math.max(words.get(word) ?? 0, field.weight));
    this.wordsOf.set(id, [...words.keys()]);
    for (const [word, weight] of words) {
      let posting = this.postings.get(word);
      if (!posting) {
        posting = { ids: [], weights: [] };
        this.postings.set(word, posting);
        this.vocabulary.add(word);
      }
      posting.ids.push(id);
      posting.weights.push(weight);
    }
  }

  remove(id: number): void {
    const words = this.wordsOf.get(id);
    if (!words) return;
    this.wordsOf.delete(id);
    for (const word of words) {
      const posting = this.postings.get(word) as Posting;
      const at = posting.ids.indexOf(id);
      const last = posting.ids.length - 1;
      posting.ids[at] = posting.ids[last];
      posting.weights[at] = posting.weights[last];
      posting.ids.pop();
      posting.weights.pop();
      if (posting.ids.length === 0) {
        this.postings.delete(word);
        this.vocabulary.remove(word);
      }
    }
  }

  /** Documents matching every word of the query, with their scores (0 best, below 1). */
  search(query: string): Map<number, number> {
    const words = [...new Set(tokenize(query))];
    if (words.length === 0) return new Map();
    let totals: Map<number, number> | null = null;
    for (const word of words) {
      const best = new Map<number, number>();
      for (const [token, score] of this.vocabulary.match(word)) {
        const posting = this.postings.get(token);
        if (!posting) continue;
        for (let i = 0; i < posting.ids.length; i++) {
          const id = posting.ids[i];
          if (totals && !totals.has(id)) continue;
          const value = score + FIELD_PENALTY * (1 - posting.weights[i]);
          if (value < (best.get(id) ?? Number.POSITIVE_INFINITY)) best.set(id, value);
        }
      }
      const next = new Map<number, number>();
      for (const [id, value] of best) next.set(id, (totals?.get(id) ?? 0) + value);
      totals = next;
      if (totals.size === 0) break;
    }
    const result = new Map<number, number>();
    for (const [id, sum] of totals ?? []) result.set(id, Math.min(0.999, sum / words.length));
    return result;
  }
}
