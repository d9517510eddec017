import type { CurationRecord } from '../../../shared/schemas/curation';
import { eluentSummary } from '../../../shared/domain/eluent-summary';
import type { CurationRow } from './records';
import { phaseLabel } from '../../core/record-presenter';

/** A record as the curation screens show it (see curationRecordSchema). */
export function presentCurationRecord(row: CurationRow): CurationRecord {
  const summary = eluentSummary(row.eluent, row.stationaryPhase);
  return {
    id: row.id,
    status: row.status,
    mergedIntoId: row.mergedIntoId,
    compound: {
      id: row.compoundId,
      name: row.compoundName,
      synonyms: row.synonyms ?? [],
      canonicalSmiles: row.canonicalSmiles,
    },
    author: { id: row.authorId, name: row.authorName },
    technique: row.technique,
    stationaryPhase: row.stationaryPhase,
    stationaryPhaseLabel: phaseLabel(row.stationaryPhase, row.stationaryPhaseOther),
    eluentNotation: summary.notation,
    strongSolvent: summary.strongSolvent,
    strongPercent: summary.strongPercent,
    targetRf: row.targetRf,
    outcome: row.outcome,
    notebookRef: row.notebookRef,
    revision: row.revision,
    createdAt: new Date(row.createdAt).toISOString(),
    updatedAt: new Date(row.updatedAt).toISOString(),
  };
}
