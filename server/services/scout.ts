import { analyseStructure, fingerprintMolecule } from '../chem';
import { Compound } from '../models';
import { UnprocessableError } from '../errors';
import { scout, ScoutOptionError } from '../scout/engine';
import type { ScoutInputParsed, ScoutResult } from '../../shared/schemas/scout';
import { fingerprintFromBytes } from './compound-fingerprints';
import { currentScoutModel } from './scout-knowledge';

/**
 * Scout for a structure text: the chemistry engine parses it (its StructureError gives 400/413/422 with the
 * reason), the stored fingerprint is used when the compound is already known, and the engine answers from the
 * cached model of the active records.
 */
export async function runScout(input: ScoutInputParsed): Promise<ScoutResult> {
  const analysis = analyseStructure(input.structure);
  const existing = await Compound.findOne({ where: { idcode: analysis.identity.idcode }, attributes: ['id', 'fingerprint'] });
  const fingerprint = existing?.fingerprint ? fingerprintFromBytes(existing.fingerprint) : fingerprintMolecule(analysis.parent);
  const model = await currentScoutModel();
  const query = { id: existing?.id ?? null, smiles: analysis.identity.canonicalSmiles, descriptors: analysis.descriptors, classes: analysis.classes, fingerprint };
  try {
    const result = scout(model, query, { targetRf: input.targetRf, solventPair: input.solventPair, phase: input.phase });
    const { descriptors } = analysis;
    return {
      query: {
        canonicalSmiles: analysis.identity.canonicalSmiles, formula: descriptors.formula, mw: descriptors.mw, clogp: descriptors.clogp, tpsa: descriptors.tpsa,
        hbd: descriptors.hbd, hba: descriptors.hba, classes: analysis.classes, svg: analysis.svg, existingCompoundId: existing?.id ?? null,
      },
      ...result,
    };
  } catch (error) {
    if (error instanceof ScoutOptionError) throw new UnprocessableError(error.message);
    throw error;
  }
}
