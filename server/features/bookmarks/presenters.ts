import type { Bookmark, Compound } from '../../db/models';
import type { BookmarkDto } from '../../../shared/schemas/bookmark';
import { presentRecordListItem, type LoadedRecord } from '../../core/record-presenter';

interface Loaded {
  records: LoadedRecord[];
  photoCounts: Map<number, number>;
  compounds: Compound[];
  /** Active records per compound id. */
  recordCounts: Map<number, number>;
}

/** Bookmarks with the record (as a list row) or the compound each points to, in the order given. */
export function presentBookmarks(bookmarks: Bookmark[], loaded: Loaded): BookmarkDto[] {
  const records = new Map(loaded.records.map((record) => [record.id, record]));
  const compounds = new Map(loaded.compounds.map((compound) => [compound.id, compound]));
  return bookmarks.map((bookmark) => {
    const record = bookmark.recordId ? records.get(bookmark.recordId) : undefined;
    const compound = bookmark.compoundId ? compounds.get(bookmark.compoundId) : undefined;
    return {
      id: bookmark.id,
      recordId: bookmark.recordId,
      compoundId: bookmark.compoundId,
      note: bookmark.note,
      createdAt: bookmark.createdAt.toISOString(),
      record: record ? presentRecordListItem(record, loaded.photoCounts.get(record.id) ?? 0) : null,
      compound: compound
        ? {
            id: compound.id,
            name: compound.name,
            canonicalSmiles: compound.canonicalSmiles,
            formula: compound.formula,
            mw: compound.mw,
            classes: compound.classes,
            recordCount: loaded.recordCounts.get(compound.id) ?? 0,
          }
        : null,
    };
  });
}
