import type { Transaction } from 'sequelize';
import { ConditionRecord, RecordContributor, RecordRevision, RecordSpot, RecordVisualisation } from '../db/models';
import type { Spot, Visualisation } from '../../shared/schemas/record-parts';
import type { RevisionAction } from '../../shared/schemas/record-history';
import { addRevision, recordState } from './record-revisions';
import { columnAttributes, derivedColumns, recordContentHash, type RecordContent } from './record-columns';

export interface NewRecordOptions {
  authorId: number;
  transaction: Transaction;
  /** The import that brought the record in, when it came from one. */
  importId?: number | null;
  /** True for the invented demo group's records. */
  demo?: boolean;
  /** Revision action of the first revision: 'create' (default) or 'import'. */
  action?: Extract<RevisionAction, 'create' | 'import'>;
  createdAt?: Date;
}

/** Writes a record's spots in order; each row remembers this record as its origin. */
export async function writeSpots(recordId: number, spots: readonly Spot[], transaction: Transaction) {
  await RecordSpot.bulkCreate(
    spots.map((spot, position) => ({ ...spot, recordId, originRecordId: recordId, position })),
    { transaction },
  );
}

export async function writeVisualisations(recordId: number, items: readonly Visualisation[], transaction: Transaction) {
  await RecordVisualisation.bulkCreate(
    items.map((item, position) => ({ ...item, recordId, originRecordId: recordId, position })),
    { transaction },
  );
}

/** The condition_records columns that follow from a record's content (derived columns and content hash included). */
export function contentColumns(content: RecordContent) {
  return {
    compoundId: content.compoundId,
    technique: content.technique as ConditionRecord['technique'],
    stationaryPhase: content.stationaryPhase,
    stationaryPhaseOther: content.stationaryPhaseOther,
    eluent: content.eluent,
    ...derivedColumns(content),
    outcome: content.outcome as ConditionRecord['outcome'],
    outcomeReason: content.outcomeReason,
    ...columnAttributes(content.column),
    notebookRef: content.notebookRef,
    notes: content.notes,
    runOn: content.runOn ?? null,
    contentHash: recordContentHash(content),
  };
}

/** The condition_records row of a new record. */
function recordAttributes(content: RecordContent, options: NewRecordOptions) {
  return {
    ...contentColumns(content),
    authorId: options.authorId,
    importId: options.importId ?? null,
    demo: options.demo ?? false,
    ...(options.createdAt ? { createdAt: options.createdAt, updatedAt: options.createdAt } : {}),
  };
}

/**
 * Inserts a complete record — row, spots, visualisations, author credit and revision 1 — inside the
 * caller's transaction. The compound must exist already (see core/compounds). Used by the API,
 * the demo seeder and imports alike.
 */
export async function insertRecord(content: RecordContent, options: NewRecordOptions): Promise<ConditionRecord> {
  const { transaction, authorId } = options;
  const record = await ConditionRecord.create(recordAttributes(content, options), { transaction });
  await writeSpots(record.id, content.spots, transaction);
  await writeVisualisations(record.id, content.visualisation, transaction);
  await RecordContributor.create(
    { recordId: record.id, userId: authorId, role: 'author', viaRecordId: null },
    { transaction },
  );
  await addRevision(record.id, authorId, options.action ?? 'create', [], transaction, options.createdAt);
  return record;
}

/**
 * Inserts many complete records inside the caller's transaction, leaving each exactly as insertRecord
 * would (row, spots, visualisations, author credit, revision 1 with its snapshot) but in six statements
 * instead of about ten per record. Imports commit their batches through it.
 */
export async function insertRecords(
  contents: readonly RecordContent[],
  options: NewRecordOptions,
): Promise<ConditionRecord[]> {
  if (contents.length === 0) return [];
  const { transaction, authorId } = options;
  const records = await ConditionRecord.bulkCreate(
    contents.map((content) => recordAttributes(content, options)),
    { transaction, returning: true },
  );
  const children = <T>(make: (record: ConditionRecord, content: RecordContent) => T[]) =>
    records.flatMap((record, index) => make(record, contents[index]));
  await RecordSpot.bulkCreate(
    children((record, content) =>
      content.spots.map((spot, position) => ({ ...spot, recordId: record.id, originRecordId: record.id, position })),
    ),
    { transaction },
  );
  await RecordVisualisation.bulkCreate(
    children((record, content) =>
      content.visualisation.map((item, position) => ({
        ...item,
        recordId: record.id,
        originRecordId: record.id,
        position,
      })),
    ),
    { transaction },
  );
  await RecordContributor.bulkCreate(
    records.map((record) => ({ recordId: record.id, userId: authorId, role: 'author' as const, viaRecordId: null })),
    { transaction },
  );
  await RecordRevision.bulkCreate(
    records.map((record, index) => ({
      recordId: record.id,
      number: 1,
      authorId,
      action: options.action ?? 'create',
      changes: [],
      snapshot: recordState(record, contents[index].spots, contents[index].visualisation, []) as unknown as Record<
        string,
        unknown
      >,
    })),
    { transaction },
  );
  return records;
}
