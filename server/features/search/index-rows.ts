import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { compoundClassByKey } from '../../../shared/catalogue/compound-classes';
import { fingerprintFromBytes } from '../../core/compound-fingerprints';
import type { CompoundDoc, RecordDoc } from './text-index';

/** A compound as the indexes read it: the stored fingerprint (never recomputed) and its text. */
export interface IndexedCompound {
  id: number;
  idcode: string;
  /** Null when the compound has no stored fingerprint (then it is not in the structure index). */
  fingerprint: Int32Array | null;
  doc: CompoundDoc;
}

interface CompoundRow {
  id: number;
  idcode: string;
  fingerprint: Buffer | null;
  name: string | null;
  synonyms: string[];
  classes: string[];
}

interface RecordRow {
  id: number;
  compound_id: number;
  status: string;
  notes: string | null;
  notebook_ref: string | null;
  outcome_reason: string | null;
}

const classNames = (keys: string[]) => keys.map((key) => compoundClassByKey(key)?.name ?? key);

/** Compounds for the indexes: all of them, or those with the given ids. */
export async function loadIndexedCompounds(ids?: number[], transaction?: Transaction): Promise<IndexedCompound[]> {
  if (ids && ids.length === 0) return [];
  const rows = await sequelize.query<CompoundRow>(
    `SELECT id, idcode, fingerprint, name, synonyms, classes FROM compounds ${ids ? 'WHERE id IN (:ids)' : ''} ORDER BY id`,
    { replacements: { ids }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((row) => ({
    id: row.id,
    idcode: row.idcode,
    fingerprint: row.fingerprint && row.fingerprint.length === 64 ? fingerprintFromBytes(row.fingerprint) : null,
    doc: { id: row.id, name: row.name ?? '', synonyms: row.synonyms, classNames: classNames(row.classes) },
  }));
}

/** Records for the text index: all active ones, or the given ids split into active docs and inactive ids. */
export async function loadRecordDocs(ids?: number[], transaction?: Transaction): Promise<{ active: RecordDoc[]; inactiveIds: number[] }> {
  if (ids && ids.length === 0) return { active: [], inactiveIds: [] };
  const rows = await sequelize.query<RecordRow>(
    `SELECT id, compound_id, status, notes, notebook_ref, outcome_reason FROM condition_records
     WHERE ${ids ? 'id IN (:ids)' : "status = 'active'"}`,
    { replacements: { ids }, type: QueryTypes.SELECT, transaction },
  );
  const active = rows.filter((row) => row.status === 'active');
  const found = new Set(active.map((row) => row.id));
  return {
    active: active.map((row) => ({
      id: row.id,
      compoundId: row.compound_id,
      notes: row.notes ?? '',
      notebookRef: row.notebook_ref ?? '',
      outcomeReason: row.outcome_reason ?? '',
    })),
    inactiveIds: (ids ?? []).filter((id) => !found.has(id)),
  };
}
