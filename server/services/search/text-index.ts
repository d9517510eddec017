import Fuse, { type IFuseOptions } from 'fuse.js';

/** What text search reads of a compound: its names and the names of its classes. */
export interface CompoundDoc {
  id: number;
  name: string;
  synonyms: string[];
  classNames: string[];
}

/** What text search reads of an active record: its notes and references. */
export interface RecordDoc {
  id: number;
  compoundId: number;
  notes: string;
  notebookRef: string;
  outcomeReason: string;
}

/**
 * Fuzzy matching: every word of the query must match somewhere (any field), each word with up to about
 * 30 % of its letters wrong (Fuse's Bitap threshold), anywhere in the text. Field length is ignored so a
 * word in a long note counts as much as in a name; names weigh most.
 */
const common = { includeScore: true, ignoreLocation: true, ignoreFieldNorm: true, threshold: 0.3, useTokenSearch: true, tokenMatch: 'all' } as const;

const compoundOptions: IFuseOptions<CompoundDoc> = {
  ...common,
  keys: [{ name: 'name', weight: 3 }, { name: 'synonyms', weight: 2 }, { name: 'classNames', weight: 1 }],
};
const recordOptions: IFuseOptions<RecordDoc> = {
  ...common,
  keys: [{ name: 'notebookRef', weight: 2 }, { name: 'notes', weight: 1 }, { name: 'outcomeReason', weight: 1 }],
};

/** Above this many changes at once, the Fuse collections are rebuilt instead of edited one by one. */
const REBUILD_AT = 200;

/** Fuse score: 0 is a perfect match, 1 none. */
export type TextHits = Map<number, number>;

/**
 * The per-process text index (fuse.js) over compound names, synonyms and class names, and over active
 * records' notes, notebook references and outcome reasons. Kept current by the search indexes' sync.
 */
export class TextIndex {
  private compounds = new Map<number, CompoundDoc>();
  private records = new Map<number, RecordDoc>();
  private compoundFuse = new Fuse<CompoundDoc>([], compoundOptions);
  private recordFuse = new Fuse<RecordDoc>([], recordOptions);

  get size(): { compounds: number; records: number } {
    return { compounds: this.compounds.size, records: this.records.size };
  }

  load(compounds: CompoundDoc[], records: RecordDoc[]): void {
    this.compounds = new Map(compounds.map((doc) => [doc.id, doc]));
    this.records = new Map(records.map((doc) => [doc.id, doc]));
    this.compoundFuse.setCollection([...this.compounds.values()]);
    this.recordFuse.setCollection([...this.records.values()]);
  }

  /** Applies changed compounds and records; `removedRecordIds` are records no longer active. */
  apply(compounds: CompoundDoc[], records: RecordDoc[], removedRecordIds: number[]): void {
    const bulk = compounds.length + records.length + removedRecordIds.length > REBUILD_AT;
    for (const doc of compounds) {
      const had = this.compounds.has(doc.id);
      this.compounds.set(doc.id, doc);
      if (bulk) continue;
      if (had) this.compoundFuse.remove((item) => item.id === doc.id);
      this.compoundFuse.add(doc);
    }
    const changedRecords = new Set([...records.map((doc) => doc.id), ...removedRecordIds]);
    for (const id of removedRecordIds) this.records.delete(id);
    for (const doc of records) this.records.set(doc.id, doc);
    if (bulk) {
      this.load([...this.compounds.values()], [...this.records.values()]);
      return;
    }
    if (changedRecords.size > 0) this.recordFuse.remove((item) => changedRecords.has(item.id));
    for (const doc of records) this.recordFuse.add(doc);
  }

  /** Compounds and records matching the words, with Fuse scores; ties between names go to the shorter name. */
  search(text: string, limit = 5_000): { compounds: TextHits; records: TextHits } {
    const compounds: TextHits = new Map();
    for (const hit of this.compoundFuse.search(text, { limit })) {
      const lengthTieBreak = Math.min(hit.item.name.length, 200) / 1e5;
      compounds.set(hit.item.id, (hit.score ?? 1) + lengthTieBreak);
    }
    const records: TextHits = new Map();
    for (const hit of this.recordFuse.search(text, { limit })) records.set(hit.item.id, hit.score ?? 1);
    return { compounds, records };
  }
}
