import type { Transaction } from 'sequelize';
import {
  ConditionRecord,
  RecordContributor,
  RecordPhoto,
  RecordRevision,
  RecordSpot,
  RecordVisualisation,
} from '../db/models';
import type { FieldChange, RevisionAction } from '../../shared/schemas/record-history';

/** The fields a contributor edits, as one plain object: what revisions snapshot and compare. */
export interface RecordState {
  compoundId: number;
  technique: string;
  stationaryPhase: string;
  stationaryPhaseOther: string | null;
  eluent: unknown;
  spots: {
    role: string;
    rf: number;
    lane: string | null;
    spotDistanceMm: number | null;
    frontDistanceMm: number | null;
    label: string | null;
  }[];
  visualisations: { method: string; note: string | null }[];
  outcome: string;
  outcomeReason: string | null;
  column: Record<string, unknown> | null;
  notebookRef: string | null;
  notes: string | null;
  runOn?: string | null;
  status: string;
  photoIds: number[];
}

export const columnFields = [
  'diameterMm',
  'cartridgeSize',
  'silicaG',
  'sampleMg',
  'loadMethod',
  'fractionMl',
  'fractionsPooled',
  'yieldPercent',
  'purityNote',
] as const;
const columnAttribute = {
  diameterMm: 'columnDiameterMm',
  cartridgeSize: 'cartridgeSize',
  silicaG: 'silicaG',
  sampleMg: 'sampleMg',
  loadMethod: 'loadMethod',
  fractionMl: 'fractionMl',
  fractionsPooled: 'fractionsPooled',
  yieldPercent: 'yieldPercent',
  purityNote: 'purityNote',
} as const;
export { columnAttribute };

/** The column details of a record row, or null when none was recorded. */
export function columnOf(
  record: Pick<ConditionRecord, (typeof columnAttribute)[keyof typeof columnAttribute]>,
): Record<(typeof columnFields)[number], unknown> | null {
  const column = Object.fromEntries(
    columnFields.map((field) => [field, record[columnAttribute[field]] ?? null]),
  ) as Record<(typeof columnFields)[number], unknown>;
  return Object.values(column).every((value) => value === null) ? null : column;
}

type StateSpot = RecordState['spots'][number];
type StateVisualisation = RecordState['visualisations'][number];

/**
 * A record's editable state from its row, spots, visualisations and photo ids: the one shape revisions snapshot,
 * whether read back from the database (loadRecordState) or built for a record just inserted.
 */
export function recordState(
  record: ConditionRecord,
  spots: readonly StateSpot[],
  visualisations: readonly StateVisualisation[],
  photoIds: number[],
): RecordState {
  return {
    compoundId: record.compoundId,
    technique: record.technique,
    stationaryPhase: record.stationaryPhase,
    stationaryPhaseOther: record.stationaryPhaseOther,
    eluent: record.eluent,
    spots: spots.map(({ role, rf, lane, spotDistanceMm, frontDistanceMm, label }) => ({
      role,
      rf,
      lane,
      spotDistanceMm,
      frontDistanceMm,
      label,
    })),
    visualisations: visualisations.map(({ method, note }) => ({ method, note })),
    outcome: record.outcome,
    outcomeReason: record.outcomeReason,
    column: columnOf(record),
    notebookRef: record.notebookRef,
    notes: record.notes,
    runOn: record.runOn ?? null,
    status: record.status,
    photoIds,
  };
}

/** Reads a record's editable state from the database (inside the caller's transaction). */
export async function loadRecordState(recordId: number, transaction?: Transaction): Promise<RecordState> {
  const record = await ConditionRecord.findByPk(recordId, { transaction, rejectOnEmpty: true });
  // One after another: a transaction is one connection, which runs one query at a time (pg 9 refuses overlapping ones).
  const spots = await RecordSpot.findAll({
    where: { recordId },
    order: [
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
  });
  const visualisations = await RecordVisualisation.findAll({
    where: { recordId },
    order: [
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
  });
  const photos = await RecordPhoto.findAll({
    where: { recordId, removedAt: null },
    order: [['id', 'ASC']],
    transaction,
    attributes: ['id'],
  });
  return recordState(
    record,
    spots,
    visualisations,
    photos.map((photo) => photo.id),
  );
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** Field-level differences between two states; column details compare field by field ("column.silicaG"). */
export function diffStates(before: RecordState, after: RecordState): FieldChange[] {
  const changes: FieldChange[] = [];
  for (const field of Object.keys(after) as (keyof RecordState)[]) {
    if (field === 'column') {
      for (const sub of columnFields) {
        const from = before.column?.[sub] ?? null;
        const to = after.column?.[sub] ?? null;
        if (!same(from, to)) changes.push({ field: `column.${sub}`, from, to });
      }
    } else if (!same(before[field], after[field])) {
      changes.push({ field, from: before[field] ?? null, to: after[field] ?? null });
    }
  }
  return changes;
}

/**
 * Stores a revision: bumps the record's revision counter, keeps who and when, the changes and the state
 * after them. A change by someone other than the author credits them as an editor.
 */
export async function addRevision(
  recordId: number,
  authorId: number | null,
  action: RevisionAction,
  changes: FieldChange[],
  transaction: Transaction,
  at?: Date,
): Promise<RecordRevision> {
  const snapshot = await loadRecordState(recordId, transaction);
  const record = await ConditionRecord.findByPk(recordId, {
    transaction,
    rejectOnEmpty: true,
    lock: transaction.LOCK.UPDATE,
  });
  const first = action === 'create' || action === 'import';
  const number = first ? 1 : record.revision + 1;
  if (!first) await record.update({ revision: number }, { transaction });
  if (authorId !== null && authorId !== record.authorId) {
    await RecordContributor.findOrCreate({
      where: { recordId, userId: authorId, role: 'editor', viaRecordId: null },
      transaction,
    });
  }
  return RecordRevision.create(
    {
      recordId,
      number,
      authorId,
      action,
      changes,
      snapshot: snapshot as unknown as Record<string, unknown>,
      ...(at ? { at } : {}),
    },
    { transaction },
  );
}
