import { Molecule } from 'openchemlib';
import { atomPairBitsOfMolecule, atomPairTanimoto, fusedSimilarity } from '../../../chem/fingerprint-atom-pairs';
import { tanimoto } from './kernel';
import { measurementNotation, measurementStrongPercent } from './format';
import type { ScoutModel } from './model';
import type { ScoutMeasurement, ScoutQuery } from './types';
import type { Neighbour } from '../../../../shared/schemas/scout';

export interface SimilarCompound {
  index: number;
  /** The similarity shown and used for advice (1 only for the query itself). */
  similarity: number;
  /** Tanimoto on the substructure keys alone — what the regression's kernel uses (engine.ts chooseVariant). */
  keys?: number;
}

const pairBits = new Map<string, Int32Array | null>();

/** Atom-pair fingerprint of a canonical SMILES, kept per process (null if OpenChemLib cannot read it). */
function atomPairsOfSmiles(smiles: string): Int32Array | null {
  let bits = pairBits.get(smiles);
  if (bits === undefined) {
    try {
      bits = atomPairBitsOfMolecule(Molecule.fromSmiles(smiles));
    } catch {
      bits = null;
    }
    if (pairBits.size > 20_000) pairBits.clear();
    pairBits.set(smiles, bits);
  }
  return bits;
}

/**
 * Every knowledge compound's similarity to the query, best first: 1 only for the query itself (same compound id,
 * or the same canonical SMILES), else the mean of the Tanimoto coefficients on OpenChemLib's substructure keys
 * (Willett 1998) and on atom pairs, at most 0.99 (server/chem/fingerprint-atom-pairs.ts), so positional
 * isomers, which share every substructure key, no longer score 1.
 */
export function rankBySimilarity(model: ScoutModel, query: ScoutQuery): SimilarCompound[] {
  const point = model.space.point(query);
  const queryPairs = atomPairsOfSmiles(query.smiles);
  return model.points
    .map((other, index) => {
      const compound = model.compounds[index];
      const keys = tanimoto(point.fingerprint, point.bits, other.fingerprint, other.bits);
      const otherPairs = queryPairs ? atomPairsOfSmiles(compound.smiles) : null;
      const identical = (query.id !== null && compound.id === query.id) || compound.smiles === query.smiles;
      return {
        index,
        keys,
        similarity: fusedSimilarity(
          keys,
          queryPairs && otherPairs ? atomPairTanimoto(queryPairs, otherPairs) : null,
          identical,
        ),
      };
    })
    .sort((a, b) => b.similarity - a.similarity || a.index - b.index);
}

const conditionLimit = 8;
const outcomeOrder = { clean: 0, partial: 1, failed: 2 } as const;

/** A neighbour's recorded conditions: plates with an Rf first, clean before partial before failed. */
function conditionsOf(measurements: readonly ScoutMeasurement[]): Neighbour['conditions'] {
  return [...measurements]
    .sort(
      (a, b) =>
        Number(b.rf !== null) - Number(a.rf !== null) ||
        outcomeOrder[a.outcome] - outcomeOrder[b.outcome] ||
        (a.rf ?? 0) - (b.rf ?? 0),
    )
    .slice(0, conditionLimit)
    .map((measurement) => ({
      recordId: measurement.recordId,
      phase: measurement.phase,
      notation: measurementNotation(measurement),
      strongPercent: measurementStrongPercent(measurement),
      rf: measurement.rf,
      outcome: measurement.outcome,
      outcomeReason: measurement.outcomeReason,
      additives: measurement.additives.map((item) => item.additive),
      visualisations: [...measurement.visualisations],
      demo: measurement.demo === true,
    }));
}

/** The k nearest compounds with their conditions; `weights` gives each one's share of the prediction, when known. */
export function listNeighbours(
  model: ScoutModel,
  ranked: readonly SimilarCompound[],
  k: number,
  weights: ReadonlyMap<number, number>,
): Neighbour[] {
  return ranked.slice(0, k).map(({ index, similarity }) => {
    const compound = model.compounds[index];
    return {
      compoundId: compound.id,
      name: compound.name,
      smiles: compound.smiles,
      similarity,
      weight: weights.get(index) ?? null,
      conditions: conditionsOf(model.measurementsOf[index]),
    };
  });
}
