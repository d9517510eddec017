import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import type { Eluent } from '../../../shared/schemas/eluent';
import type { ConditionRecord } from '../../db/models';

/** One record joined with its compound and author, as the curation services read it. */
export interface CurationRow {
  id: number;
  status: ConditionRecord['status'];
  mergedIntoId: number | null;
  compoundId: number;
  compoundName: string | null;
  synonyms: string[];
  canonicalSmiles: string;
  idcode: string;
  stereocentres: number;
  authorId: number;
  authorName: string;
  technique: ConditionRecord['technique'];
  stationaryPhase: string;
  stationaryPhaseOther: string | null;
  eluent: Eluent;
  strongPercent: number | null;
  targetRf: number | null;
  outcome: ConditionRecord['outcome'];
  outcomeReason: string | null;
  notebookRef: string | null;
  notes: string | null;
  revision: number;
  createdAt: Date;
  updatedAt: Date;
}

const select = `
  SELECT r.id, r.status, r.merged_into_id AS "mergedIntoId", r.compound_id AS "compoundId", c.name AS "compoundName",
         c.synonyms, c.canonical_smiles AS "canonicalSmiles", c.idcode, c.stereocentres, r.author_id AS "authorId",
         u.name AS "authorName", r.technique, r.stationary_phase AS "stationaryPhase",
         r.stationary_phase_other AS "stationaryPhaseOther", r.eluent, r.strong_percent AS "strongPercent",
         r.target_rf AS "targetRf", r.outcome, r.outcome_reason AS "outcomeReason", r.notebook_ref AS "notebookRef",
         r.notes, r.revision, r.created_at AS "createdAt", r.updated_at AS "updatedAt"
  FROM condition_records r JOIN compounds c ON c.id = r.compound_id JOIN users u ON u.id = r.author_id`;

/** Every active record, oldest first (the duplicate finder's input). */
export function activeCurationRows(): Promise<CurationRow[]> {
  return sequelize.query<CurationRow>(`${select} WHERE r.status = 'active' ORDER BY r.id`, { type: QueryTypes.SELECT });
}

/** Records by id, in the order given; missing ids are left out. */
export async function curationRowsByIds(ids: readonly number[], transaction?: Transaction): Promise<CurationRow[]> {
  if (ids.length === 0) return [];
  const rows = await sequelize.query<CurationRow>(`${select} WHERE r.id IN (:ids)`, {
    replacements: { ids: [...ids] },
    type: QueryTypes.SELECT,
    transaction,
  });
  const byId = new Map(rows.map((row) => [row.id, row]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

/**
 * A record's signature for dismissals: id, revision and updated_at (ms). A dismissal of a group stores
 * the signatures of its records; any edit, merge or status change moves one of them.
 */
function recordSignature(row: Pick<CurationRow, 'id' | 'revision' | 'updatedAt'>): string {
  return `${row.id}@${row.revision}:${new Date(row.updatedAt).getTime()}`;
}

/** Signature of a group: its records' signatures in id order. */
export function groupSignature(rows: readonly Pick<CurationRow, 'id' | 'revision' | 'updatedAt'>[]): string {
  return [...rows]
    .sort((a, b) => a.id - b.id)
    .map(recordSignature)
    .join(',');
}
