import { tanimoto } from './kernel';
import { measurementNotation, measurementStrongPercent } from './format';
import type { ScoutModel } from './model';
import type { ScoutMeasurement, ScoutQuery } from './types';
import type { Neighbour } from '../../../../shared/schemas/scout';

export interface SimilarCompound {
  index: number;
  similarity: number;
}

/** Every knowledge compound's Tanimoto similarity to the query (OpenChemLib fingerprints; Willett 1998), best first. */
export function rankBySimilarity(model: ScoutModel, query: ScoutQuery): SimilarCompound[] {
  const point = model.space.point(query);
  return model.points
    .map((other, index) => ({ index, similarity: tanimoto(point.fingerprint, point.bits, other.fingerprint, other.bits) }))
    .sort((a, b) => b.similarity - a.similarity || a.index - b.index);
}

const conditionLimit = 8;
const outcomeOrder = { clean: 0, partial: 1, failed: 2 } as const;

/** A neighbour's recorded conditions: plates with an Rf first, clean before partial before failed. */
export function conditionsOf(measurements: readonly ScoutMeasurement[]): Neighbour['conditions'] {
  return [...measurements]
    .sort((a, b) => Number(b.rf !== null) - Number(a.rf !== null) || outcomeOrder[a.outcome] - outcomeOrder[b.outcome] || (a.rf ?? 0) - (b.rf ?? 0))
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
    }));
}

/** The k nearest compounds with their conditions; `weights` gives each one's share of the prediction, when known. */
export function listNeighbours(model: ScoutModel, ranked: readonly SimilarCompound[], k: number, weights: ReadonlyMap<number, number>): Neighbour[] {
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
