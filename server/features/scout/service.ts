import { LRUCache } from 'lru-cache';
import { analyseStructure, type CompoundDescriptors } from '../../chem';
import { Compound } from '../../db/models';
import { UnprocessableError } from '../../http/errors';
import { scout, ScoutOptionError } from './engine/engine';
import type { ScoutInputParsed, ScoutResult } from '../../../shared/schemas/scout';
import { fingerprintFromBytes, fingerprintOfIdcode } from '../../core/compound-fingerprints';
import { currentScoutModel } from './knowledge';
import { contentStamp } from '../../db/data-stamp';

/** What Scout needs of a structure text; it depends on the text alone, so it is kept (LRU) across data changes. */
interface ReadStructure {
  idcode: string;
  canonicalSmiles: string;
  descriptors: CompoundDescriptors;
  classes: string[];
  svg: string;
  /**
   * Fingerprint of the neutral parent from its ID code, as stored ones are; computed in the worker pool on first need
   * (a stored compound's is used instead).
   */
  parentFingerprint: () => Promise<Int32Array>;
}

const readStructures = new LRUCache<string, ReadStructure>({ max: 2_000 });

/** Parses and describes a structure text once (~10–20 ms); StructureError (400/413/422) for input the engine refuses. */
function readStructure(text: string): ReadStructure {
  const hit = readStructures.get(text);
  if (hit) return hit;
  const analysis = analyseStructure(text);
  const { idcode, canonicalSmiles } = analysis.identity;
  let fingerprint: Promise<Int32Array> | undefined;
  const read: ReadStructure = {
    idcode,
    canonicalSmiles,
    descriptors: analysis.descriptors,
    classes: analysis.classes,
    svg: analysis.svg,
    parentFingerprint: () =>
      (fingerprint ??= fingerprintOfIdcode(idcode).catch((error: unknown) => {
        fingerprint = undefined;
        throw error;
      })),
  };
  readStructures.set(text, read);
  return read;
}

/**
 * Scout for a structure text: the chemistry engine parses it (its StructureError gives 400/413/422 with the
 * reason), the stored fingerprint is used when the compound is already known, and the engine answers from the
 * model of the active records as of `stamp` (db/data-stamp.ts; the current one when not given).
 */
export async function runScout(input: ScoutInputParsed, stamp?: string): Promise<ScoutResult> {
  const structure = readStructure(input.structure);
  const existing = await Compound.findOne({ where: { idcode: structure.idcode }, attributes: ['id', 'fingerprint'] });
  const fingerprint = existing?.fingerprint
    ? fingerprintFromBytes(existing.fingerprint)
    : await structure.parentFingerprint();
  const model = await currentScoutModel(stamp ?? (await contentStamp()));
  const query = {
    id: existing?.id ?? null,
    smiles: structure.canonicalSmiles,
    descriptors: structure.descriptors,
    classes: structure.classes,
    fingerprint,
  };
  try {
    const result = scout(model, query, {
      targetRf: input.targetRf,
      solventPair: input.solventPair,
      phase: input.phase,
    });
    const { descriptors } = structure;
    return {
      query: {
        canonicalSmiles: structure.canonicalSmiles,
        formula: descriptors.formula,
        mw: descriptors.mw,
        clogp: descriptors.clogp,
        tpsa: descriptors.tpsa,
        hbd: descriptors.hbd,
        hba: descriptors.hba,
        classes: structure.classes,
        svg: structure.svg,
        existingCompoundId: existing?.id ?? null,
      },
      ...result,
    };
  } catch (error) {
    if (error instanceof ScoutOptionError) throw new UnprocessableError(error.message);
    throw error;
  }
}
