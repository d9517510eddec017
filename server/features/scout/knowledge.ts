import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { fingerprintIdcodeSync } from '../../chem';
import { buildScoutModel } from './engine/engine';
import type { ScoutModel } from './engine/model';
import type { KnowledgeSet, ScoutCompound, ScoutMeasurement } from './engine/types';
import type { Eluent } from '../../../shared/schemas/eluent';
import { fingerprintFromBytes } from '../../core/compound-fingerprints';

const signatureSql = `
  SELECT (SELECT count(*) FROM condition_records WHERE status = 'active') AS active,
         (SELECT coalesce(max(updated_at)::text, '') || ':' || coalesce(sum(revision), 0) FROM condition_records) AS records,
         (SELECT count(*) || ':' || coalesce(max(id), 0) || ':' || coalesce(sum(record_id), 0) FROM record_spots
           WHERE role = 'target') AS spots,
         (SELECT count(*) || ':' || coalesce(sum(record_id), 0) FROM record_visualisations) AS stains,
         (SELECT coalesce(max(updated_at)::text, '') FROM compounds) AS compounds`;

/** A fingerprint of everything the knowledge set reads: changes whenever a record, spot, stain or compound does. */
async function knowledgeSignature(): Promise<string> {
  const [row] = await sequelize.query<Record<string, string>>(signatureSql, { type: QueryTypes.SELECT });
  return Object.values(row).join('|');
}

interface RecordRow {
  id: number;
  compound_id: number;
  stationary_phase: string;
  eluent: Eluent;
  outcome: ScoutMeasurement['outcome'];
  outcome_reason: string | null;
  demo: boolean;
}
interface CompoundRow {
  id: number;
  idcode: string;
  name: string | null;
  canonical_smiles: string;
  formula: string;
  mw: number;
  clogp: number;
  tpsa: number;
  hbd: number;
  hba: number;
  rotatable_bonds: number;
  aromatic_rings: number;
  stereocentres: number;
  charge: number;
  classes: string[];
  fingerprint: Buffer | null;
}

const missingFingerprints = new Map<string, Int32Array>();

/** Active condition records (not merged or retired) as Scout's knowledge set; stored fingerprints are used as they are. */
async function loadKnowledge(version: string): Promise<KnowledgeSet> {
  const records = await sequelize.query<RecordRow>(
    `SELECT id, compound_id, stationary_phase, eluent, outcome, outcome_reason, demo FROM condition_records ` +
      `WHERE status = 'active' ORDER BY id`,
    { type: QueryTypes.SELECT },
  );
  const spots = await sequelize.query<{ record_id: number; rf: number }>(
    `SELECT s.record_id, s.rf FROM record_spots s JOIN condition_records r ON r.id = s.record_id WHERE ` +
      `r.status = 'active' AND s.role = 'target'`,
    { type: QueryTypes.SELECT },
  );
  const stains = await sequelize.query<{ record_id: number; method: string }>(
    `SELECT v.record_id, v.method FROM record_visualisations v JOIN condition_records r ON r.id = ` +
      `v.record_id WHERE r.status = 'active' ORDER BY v.record_id, v.position`,
    { type: QueryTypes.SELECT },
  );
  const compounds = await sequelize.query<CompoundRow>(
    `SELECT id, idcode, name, canonical_smiles, formula, mw, clogp, tpsa, hbd, hba, rotatable_bonds, aromatic_rings,
      stereocentres, charge, classes, fingerprint
       FROM compounds WHERE id IN (SELECT compound_id FROM condition_records WHERE status = 'active') ORDER BY id`,
    { type: QueryTypes.SELECT },
  );
  const rfOf = new Map(spots.map((spot) => [spot.record_id, spot.rf]));
  const stainsOf = new Map<number, string[]>();
  for (const stain of stains) stainsOf.set(stain.record_id, [...(stainsOf.get(stain.record_id) ?? []), stain.method]);
  const measurements: ScoutMeasurement[] = records.map((record) => ({
    recordId: record.id,
    compoundId: record.compound_id,
    phase: record.stationary_phase,
    components: record.eluent.components,
    additives: record.eluent.additives ?? [],
    mode: record.eluent.mode ?? 'isocratic',
    rf: rfOf.get(record.id) ?? null,
    outcome: record.outcome,
    outcomeReason: record.outcome_reason,
    visualisations: stainsOf.get(record.id) ?? [],
    demo: record.demo,
  }));
  const scoutCompounds: ScoutCompound[] = compounds.map((row) => ({
    id: row.id,
    name: row.name,
    smiles: row.canonical_smiles,
    descriptors: {
      formula: row.formula,
      mw: row.mw,
      clogp: row.clogp,
      tpsa: row.tpsa,
      hbd: row.hbd,
      hba: row.hba,
      rotatableBonds: row.rotatable_bonds,
      aromaticRings: row.aromatic_rings,
      stereocentres: row.stereocentres,
      charge: row.charge,
    },
    classes: row.classes,
    fingerprint: row.fingerprint ? fingerprintFromBytes(row.fingerprint) : fallbackFingerprint(row.idcode),
  }));
  return { version, compounds: scoutCompounds, measurements };
}

/** A compound stored without a fingerprint (should not happen) gets one computed once per process. */
function fallbackFingerprint(idcode: string): Int32Array {
  let words = missingFingerprints.get(idcode);
  if (!words) {
    words = fingerprintIdcodeSync(idcode);
    missingFingerprints.set(idcode, words);
  }
  return words;
}

let cached: { signature: string; model: ScoutModel; stamp: string } | null = null;
let pending: { stamp: string; promise: Promise<ScoutModel> } | null = null;

async function refresh(stamp: string): Promise<ScoutModel> {
  const signature = await knowledgeSignature();
  if (cached && cached.signature === signature) {
    cached.stamp = stamp;
    return cached.model;
  }
  const model = buildScoutModel(await loadKnowledge(signature));
  cached = { signature, model, stamp };
  return model;
}

/**
 * The Scout model of the records as of the (content) stamp `stamp` (db/data-stamp.ts), cached in this process.
 * While the stamp is unchanged (no content committed since) the model is used as is; after a change a cheap
 * signature query (counts and latest change times) decides whether to reload. So every process follows every
 * committed write on its next Scout, without messages between processes.
 */
export async function currentScoutModel(stamp: string): Promise<ScoutModel> {
  if (cached && cached.stamp === stamp) return cached.model;
  if (pending?.stamp === stamp) return pending.promise;
  const promise = refresh(stamp).finally(() => {
    if (pending?.promise === promise) pending = null;
  });
  pending = { stamp, promise };
  return promise;
}
