import type { Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import type { MergeableField } from '../../../shared/schemas/curation';
import { ConditionRecord } from '../../db/models';
import { derivedColumns, recordContentHash, type RecordContent } from '../../core/record-columns';
import { loadRecordState } from '../../core/record-revisions';

/** The row columns each choosable field stands for; the filter columns derived from them are recomputed after (refreshDerivedColumns). */
const fieldColumns: Record<MergeableField, readonly string[]> = {
  compound: ['compound_id'],
  technique: ['technique'],
  stationaryPhase: ['stationary_phase', 'stationary_phase_other'],
  eluent: ['eluent'],
  outcome: ['outcome', 'outcome_reason'],
  'column.diameterMm': ['column_diameter_mm'],
  'column.cartridgeSize': ['cartridge_size'],
  'column.silicaG': ['silica_g'],
  'column.sampleMg': ['sample_mg'],
  'column.loadMethod': ['load_method'],
  'column.fractionMl': ['fraction_ml'],
  'column.fractionsPooled': ['fractions_pooled'],
  'column.yieldPercent': ['yield_percent'],
  'column.purityNote': ['purity_note'],
  notebookRef: ['notebook_ref'],
};

/** Copies each chosen field's columns from the record it is taken from onto the survivor. */
export async function applyFieldChoices(
  survivorId: number,
  fields: Partial<Record<MergeableField, number>>,
  transaction: Transaction,
) {
  for (const [field, sourceId] of Object.entries(fields) as [MergeableField, number][]) {
    if (sourceId === survivorId) continue;
    const assignments = fieldColumns[field].map((column) => `${column} = src.${column}`).join(', ');
    await sequelize.query(
      `UPDATE condition_records s SET ${assignments} FROM condition_records src WHERE s.id = :survivorId AND src.id = :sourceId`,
      { replacements: { survivorId, sourceId }, transaction },
    );
  }
}

interface NoteSource {
  id: number;
  notes: string | null;
  authorName: string;
  createdAt: Date;
}

/**
 * The survivor's notes with every merged record's notes appended under a line naming the record, its
 * author and date, so no one's notes are lost or passed off as another's.
 */
export function unitedNotes(survivorNotes: string | null, merged: readonly NoteSource[]): string | null {
  const parts = survivorNotes?.trim() ? [survivorNotes.trim()] : [];
  for (const record of merged) {
    if (!record.notes?.trim()) continue;
    const day = new Date(record.createdAt).toISOString().slice(0, 10);
    parts.push(`[From record #${record.id}, ${record.authorName}, ${day}]\n${record.notes.trim()}`);
  }
  return parts.length > 0 ? parts.join('\n\n') : null;
}

/**
 * Recomputes the survivor's filter columns (solvent and additive keys, mode, % strong solvent, target Rf
 * from its first target spot) and its content hash from what it holds after the merge (records service rules).
 */
export async function refreshDerivedColumns(recordId: number, transaction: Transaction) {
  const state = await loadRecordState(recordId, transaction);
  const content = {
    compoundId: state.compoundId,
    technique: state.technique,
    stationaryPhase: state.stationaryPhase,
    stationaryPhaseOther: state.stationaryPhaseOther,
    eluent: state.eluent,
    spots: state.spots,
    visualisation: state.visualisations,
    outcome: state.outcome,
    outcomeReason: state.outcomeReason,
    column: state.column,
    notebookRef: state.notebookRef,
    notes: state.notes,
  } as RecordContent;
  await ConditionRecord.update(
    { ...derivedColumns(content), contentHash: recordContentHash(content) },
    { where: { id: recordId }, transaction, silent: true },
  );
}
