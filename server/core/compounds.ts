import { EventEmitter } from 'node:events';
import type { Transaction } from 'sequelize';
import { Compound } from '../db/models';
import { UnprocessableError } from '../http/errors';
import { analyseStructure, descriptorsOf, type StructureAnalysis } from './compound-analysis';
import { fingerprintBytes } from './compound-fingerprints';

/**
 * Emits `upsert` with a compound id after a compound is created or renamed (after the transaction
 * commits), so the search index in this process stays current. Other processes rebuild from the database.
 */
export const compoundEvents = new EventEmitter<{ upsert: [compoundId: number] }>();

function announce(id: number, transaction?: Transaction) {
  if (transaction) transaction.afterCommit(() => void compoundEvents.emit('upsert', id));
  else compoundEvents.emit('upsert', id);
}

/** Keeps a name on a compound: the first name becomes its name, later different ones its synonyms. */
async function attachName(
  compound: Compound,
  name: string | null | undefined,
  transaction?: Transaction,
): Promise<void> {
  const clean = name?.trim();
  if (!clean) return;
  const known = [compound.name, ...compound.synonyms].filter(Boolean).map((value) => (value as string).toLowerCase());
  if (known.includes(clean.toLowerCase())) return;
  if (!compound.name) await compound.update({ name: clean }, { transaction });
  else await compound.update({ synonyms: [...compound.synonyms, clean] }, { transaction });
  announce(compound.id, transaction);
}

function rowOf(
  text: string,
  analysis: StructureAnalysis,
  name: string | null,
  userId: number | null,
  fingerprint: Buffer | null,
) {
  return {
    idcode: analysis.idcode,
    name,
    synonyms: [],
    inputStructure: text,
    canonicalSmiles: analysis.canonicalSmiles,
    molfile: analysis.molfile,
    ...descriptorsOf(analysis),
    classes: analysis.classes,
    fingerprint,
    createdBy: userId,
  };
}

export interface CompoundRequest {
  structure: string;
  name?: string | null;
  /** The structure's analysis when the caller already has it (an import analyses each text once). */
  analysis?: StructureAnalysis;
}

/**
 * Finds or creates one compound row per canonical identity for each structure text (SMILES or molfile),
 * in order. New compounds get descriptors, classes and a fingerprint computed in the worker pool, in one
 * batch, never twice for one identity (`fingerprints` passes those computed ahead, by ID code). Names are
 * kept as name or synonym. Throws StructureError on bad input.
 */
export async function findOrCreateCompounds(
  requests: CompoundRequest[],
  options: { userId: number | null; transaction?: Transaction; fingerprints?: ReadonlyMap<string, Buffer | null> },
): Promise<Compound[]> {
  const { transaction, userId } = options;
  const analyses = requests.map((request) => request.analysis ?? analyseStructure(request.structure));
  const idcodes = [...new Set(analyses.map((analysis) => analysis.idcode))];
  const existing = await Compound.findAll({ where: { idcode: idcodes }, transaction });
  const known = new Map(existing.map((compound) => [compound.idcode, compound]));
  const fresh = idcodes.filter((idcode) => !known.has(idcode));
  if (fresh.length > 0) {
    const missing = fresh.filter((idcode) => !options.fingerprints?.has(idcode));
    const computed = new Map((await fingerprintBytes(missing)).map((bytes, index) => [missing[index], bytes]));
    const fingerprints = fresh.map((idcode) => options.fingerprints?.get(idcode) ?? computed.get(idcode) ?? null);
    const rows = fresh.map((idcode, index) => {
      const at = analyses.findIndex((analysis) => analysis.idcode === idcode);
      return rowOf(
        requests[at].structure,
        analyses[at],
        requests[at].name?.trim() || analyses[at].name,
        userId,
        fingerprints[index],
      );
    });
    await Compound.bulkCreate(rows, { transaction, ignoreDuplicates: true });
    for (const compound of await Compound.findAll({ where: { idcode: fresh }, transaction })) {
      known.set(compound.idcode, compound);
      announce(compound.id, transaction);
    }
  }
  const result: Compound[] = [];
  for (const [index, analysis] of analyses.entries()) {
    const compound = known.get(analysis.idcode) as Compound;
    await attachName(compound, requests[index].name ?? analysis.name, transaction);
    result.push(compound);
  }
  return result;
}

/** One structure's compound (see findOrCreateCompounds). */
export async function findOrCreateCompound(
  structure: string,
  options: { name?: string | null; userId: number | null; transaction?: Transaction },
) {
  const [compound] = await findOrCreateCompounds([{ structure, name: options.name }], options);
  return compound;
}

/** The compound a record names: by structure text or by id (422 when the id is unknown). */
export async function resolveCompound(
  input: { structure?: string; compoundId?: number; name?: string },
  userId: number,
  transaction?: Transaction,
): Promise<Compound> {
  if (input.structure !== undefined)
    return findOrCreateCompound(input.structure, { name: input.name, userId, transaction });
  const compound = await Compound.findByPk(input.compoundId, { transaction });
  if (!compound)
    throw new UnprocessableError(`No compound with id ${input.compoundId}.`, [
      { path: 'body.compoundId', message: 'Unknown compound.' },
    ]);
  await attachName(compound, input.name, transaction);
  return compound;
}
