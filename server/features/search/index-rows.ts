import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { compoundClassByKey } from '../../../shared/catalogue/compound-classes';
import { additiveByKey } from '../../../shared/catalogue/additives';
import { solventByKey } from '../../../shared/catalogue/solvents';
import { stainByKey } from '../../../shared/catalogue/stains';
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
  eluent: {
    components?: { solvent: string }[];
    steps?: { components?: { solvent: string }[] }[];
    additives?: { additive: string }[];
  } | null;
  stains: { method: string; note: string | null }[] | null;
}

/**
 * The words a chemist types for a record's conditions: each solvent's and additive's label and name
 * ("EtOAc ethyl acetate"), each stain's label, name and synonyms ("KMnO4 potassium permanganate",
 * "Dragendorff reagent") and a free-text visualisation's own words.
 */
export function conditionWords(row: Pick<RecordRow, 'eluent' | 'stains'>): string {
  const words = new Set<string>();
  const solventKeys = [
    ...(row.eluent?.components ?? []),
    ...(row.eluent?.steps ?? []).flatMap((step) => step.components ?? []),
  ].map((part) => part.solvent);
  for (const key of solventKeys) {
    const solvent = solventByKey(key);
    words.add(solvent ? `${solvent.label} ${solvent.name}` : key);
  }
  for (const item of row.eluent?.additives ?? []) {
    const additive = additiveByKey(item.additive);
    words.add(additive ? `${additive.label} ${additive.name}` : item.additive);
  }
  for (const item of row.stains ?? []) {
    const stain = stainByKey(item.method);
    words.add(stain ? [stain.label, stain.name, ...stain.synonyms].join(' ') : item.method);
    if (item.note) words.add(item.note);
  }
  return [...words].join(' ');
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
export async function loadRecordDocs(
  ids?: number[],
  transaction?: Transaction,
): Promise<{ active: RecordDoc[]; inactiveIds: number[] }> {
  if (ids && ids.length === 0) return { active: [], inactiveIds: [] };
  const rows = await sequelize.query<RecordRow>(
    `SELECT r.id, r.compound_id, r.status, r.notes, r.notebook_ref, r.outcome_reason, r.eluent,
       (SELECT json_agg(json_build_object('method', v.method, 'note', v.note) ORDER BY v.position)
          FROM record_visualisations v WHERE v.record_id = r.id) AS stains
     FROM condition_records r
     WHERE ${ids ? 'r.id IN (:ids)' : "r.status = 'active'"}`,
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
      conditions: conditionWords(row),
    })),
    inactiveIds: (ids ?? []).filter((id) => !found.has(id)),
  };
}
