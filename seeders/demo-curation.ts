// INVENTED DEMO DATA for the curation queue: one structure entered a second time as a separate compound.
// The record copies an invented demo record; nothing here is a measurement.
import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../server/db/sequelize';
import { findOrCreateCompound } from '../server/core/compounds';
import { insertRecord } from '../server/core/record-rows';
import { loadRecordState } from '../server/core/record-revisions';
import type { RecordContent } from '../server/core/record-columns';

/**
 * Seeds a "same compound under another name" case: 1-phenylethanol's first clean TLC entered again by a
 * colleague who drew the (S) enantiomer and named it so. Returns the new record's id, or null when the
 * demo has no such record to copy.
 */
export async function seedDemoStructureDuplicate(transaction: Transaction): Promise<number | null> {
  const [original] = await sequelize.query<{ id: number; authorId: number; createdAt: Date }>(
    `SELECT r.id, r.author_id AS "authorId", r.created_at AS "createdAt" FROM condition_records r JOIN compounds c ON c.id = r.compound_id
     WHERE c.name = '1-phenylethanol' AND r.demo AND r.technique = 'tlc' AND r.outcome = 'clean' ORDER BY r.id LIMIT 1`,
    { type: QueryTypes.SELECT, transaction },
  );
  if (!original) return null;
  const [colleague] = await sequelize.query<{ id: number }>(
    'SELECT DISTINCT author_id AS id FROM condition_records WHERE demo AND author_id <> :authorId ORDER BY author_id LIMIT 1',
    { replacements: { authorId: original.authorId }, type: QueryTypes.SELECT, transaction },
  );
  const authorId = colleague?.id ?? original.authorId;
  const state = await loadRecordState(original.id, transaction);
  const compound = await findOrCreateCompound('C[C@H](O)c1ccccc1', {
    name: '(S)-1-phenylethanol',
    userId: authorId,
    transaction,
  });
  const spots = state.spots.map((spot) =>
    spot.role === 'target' ? { ...spot, rf: Math.round((spot.rf + 0.01) * 100) / 100 } : spot,
  );
  const content = {
    compoundId: compound.id,
    technique: state.technique,
    stationaryPhase: state.stationaryPhase,
    stationaryPhaseOther: state.stationaryPhaseOther,
    eluent: state.eluent,
    spots,
    visualisation: state.visualisations,
    outcome: state.outcome,
    outcomeReason: state.outcomeReason,
    column: state.column,
    notebookRef: null,
    notes: 'Drawn as the (S) alcohol from the bottle label; the plate ran exactly as before.',
  } as RecordContent;
  const createdAt = new Date(new Date(original.createdAt).getTime() + 12 * 86_400_000);
  const record = await insertRecord(content, { authorId, transaction, demo: true, createdAt });
  return record.id;
}
