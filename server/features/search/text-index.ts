import { FuzzyDocIndex, type WeightedFields } from './fuzzy-doc-index';

/** What text search reads of a compound: its names and the names of its classes. */
export interface CompoundDoc {
  id: number;
  name: string;
  synonyms: string[];
  classNames: string[];
}

/** What text search reads of an active record: its notes, references and the words of its conditions. */
export interface RecordDoc {
  id: number;
  compoundId: number;
  notes: string;
  notebookRef: string;
  outcomeReason: string;
  /** Solvents, additives and stains by label, name and synonyms (see index-rows.ts conditionWords). */
  conditions?: string;
}

/** Fuzzy-match scores by id: 0 is a perfect match, 1 none. */
export type TextHits = Map<number, number>;

/** How much worse than the best match a match may be and still count (Fuse score units). */
const RELATIVE_CUTOFF = 0.2;

/** Names weigh most, then synonyms, then class names. */
const compoundFields = (doc: CompoundDoc): WeightedFields => [
  { text: doc.name, weight: 1 },
  { text: doc.synonyms.join(' '), weight: 0.8 },
  { text: doc.classNames.join(' '), weight: 0.5 },
];

/** Notebook references weigh most, then notes and the outcome's reason, then the eluent's and stains' words. */
const recordFields = (doc: RecordDoc): WeightedFields => [
  { text: doc.notebookRef, weight: 1 },
  { text: doc.notes, weight: 0.8 },
  { text: doc.outcomeReason, weight: 0.8 },
  { text: doc.conditions ?? '', weight: 0.6 },
];

/**
 * The per-process text index over compound names, synonyms and class names, and over active records'
 * notes, notebook references and outcome reasons; typos are matched with fuse.js (see FuzzyDocIndex).
 * Kept current document by document by the search indexes' sync, never rebuilt per request.
 */
export class TextIndex {
  private compounds = new FuzzyDocIndex();
  private records = new FuzzyDocIndex();
  private nameLength = new Map<number, number>();

  get size(): { compounds: number; records: number } {
    return { compounds: this.compounds.size, records: this.records.size };
  }

  load(compounds: CompoundDoc[], records: RecordDoc[]): void {
    this.compounds = new FuzzyDocIndex();
    this.records = new FuzzyDocIndex();
    this.nameLength.clear();
    this.apply(compounds, records, []);
  }

  /** Applies changed compounds and records; `removedRecordIds` are records no longer active. */
  apply(compounds: CompoundDoc[], records: RecordDoc[], removedRecordIds: number[]): void {
    for (const doc of compounds) {
      this.compounds.set(doc.id, compoundFields(doc));
      this.nameLength.set(doc.id, doc.name.length);
    }
    for (const id of removedRecordIds) this.records.remove(id);
    for (const doc of records) this.records.set(doc.id, recordFields(doc));
  }

  /**
   * Compounds and records matching every word; ties between compounds go to the shorter name (the closer
   * match). Matches much worse than the best one (by more than RELATIVE_CUTOFF) are dropped: when a name
   * matches exactly, a word two letters away in another name ("cinnam" in "nicotinamide") is noise.
   */
  search(text: string): { compounds: TextHits; records: TextHits } {
    const compounds = this.compounds.search(text);
    for (const [id, score] of compounds) compounds.set(id, score + Math.min(this.nameLength.get(id) ?? 0, 200) / 1e5);
    const records = this.records.search(text);
    let best = Number.POSITIVE_INFINITY;
    for (const hits of [compounds, records]) for (const score of hits.values()) best = Math.min(best, score);
    for (const hits of [compounds, records])
      for (const [id, score] of hits) if (score > best + RELATIVE_CUTOFF) hits.delete(id);
    return { compounds, records };
  }
}
