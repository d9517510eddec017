import { rfToRm, rmToRf } from '../../shared/domain/rf';
import { rfClampRange } from '../../shared/domain/soczewinski';
import { buildScoutModel, predictRf, scout } from '../../server/features/scout/engine/engine';
import type { ScoutModel } from '../../server/features/scout/engine/model';
import type { KnowledgeSet, ScoutCompound, ScoutMeasurement } from '../../server/features/scout/engine/types';

/**
 * Scoring of Scout on held-out compounds (the evaluation of issue 6): mean absolute error of Rf over every
 * measurement of the held-out compounds, the same for the structure-blind baseline (mean Rf of the eluent among
 * the knowledge compounds), and the hit rate of the suggested hexane/EtOAc ratio for Rf 0.3.
 */

export const hitWindow = [0.15, 0.45] as const;
const hexanes = 'hexanes';
const ethylAcetate = 'ethyl-acetate';

export const eluentKey = (components: ScoutMeasurement['components']) =>
  [...components]
    .filter((part) => part.parts > 0)
    .sort((a, b) => a.solvent.localeCompare(b.solvent))
    .map((part) => `${part.solvent}:${(part.parts / components.reduce((sum, item) => sum + item.parts, 0)).toFixed(4)}`)
    .join('|');

/** Mean Rf per eluent over a knowledge set: the structure-blind baseline. */
export function eluentMeans(knowledge: KnowledgeSet): Map<string, number> {
  const sums = new Map<string, [number, number]>();
  for (const measurement of knowledge.measurements) {
    if (measurement.rf === null) continue;
    const key = eluentKey(measurement.components);
    const [sum, count] = sums.get(key) ?? [0, 0];
    sums.set(key, [sum + measurement.rf, count + 1]);
  }
  return new Map([...sums].map(([key, [sum, count]]) => [key, sum / count]));
}

/** EtOAc volume fraction of a hexane/EtOAc (or pure) eluent, or null for other eluents. */
function ethylAcetateFraction(components: ScoutMeasurement['components']): number | null {
  if (components.some((part) => part.parts > 0 && part.solvent !== hexanes && part.solvent !== ethylAcetate))
    return null;
  const total = components.reduce((sum, part) => sum + part.parts, 0);
  return (components.find((part) => part.solvent === ethylAcetate)?.parts ?? 0) / total;
}

export const clampedRm = (rf: number) => rfToRm(Math.min(Math.max(rf, rfClampRange[0]), rfClampRange[1]));

/**
 * The compound's own measured Rf at an EtOAc fraction: RM interpolated linearly against log10 of the fraction
 * between its measured hexane/EtOAc points (end segments extended); pure hexane is used only for a suggestion of
 * pure hexane. Null when fewer than two points with EtOAc were measured.
 */
export function measuredRfAt(measurements: readonly ScoutMeasurement[], fraction: number): number | null {
  const points = new Map<number, number[]>();
  for (const measurement of measurements) {
    const x = ethylAcetateFraction(measurement.components);
    if (x === null || measurement.rf === null) continue;
    points.set(x, [...(points.get(x) ?? []), clampedRm(measurement.rf)]);
  }
  if (fraction === 0 && points.has(0)) return rmToRf(average(points.get(0)!));
  const curve = [...points]
    .filter(([x]) => x > 0)
    .map(([x, rms]) => ({ lx: Math.log10(x), rm: average(rms) }))
    .sort((a, b) => a.lx - b.lx);
  if (curve.length < 2) return null;
  const lx = Math.log10(Math.max(fraction, 1e-3));
  let upper = curve.findIndex((point) => point.lx >= lx);
  if (upper <= 0) upper = upper === 0 ? 1 : curve.length - 1;
  const a = curve[upper - 1];
  const b = curve[upper];
  return rmToRf(a.rm + ((lx - a.lx) * (b.rm - a.rm)) / (b.lx - a.lx));
}

const average = (values: readonly number[]) => values.reduce((sum, value) => sum + value, 0) / values.length;

export interface CompoundScore {
  compoundId: number;
  errors: number[];
  baselineErrors: number[];
  /** Whether the suggested hexane/EtOAc ratio for Rf 0.3 lands in the window on the measured curve; null without a curve. */
  hit: boolean | null;
  confidence: 'high' | 'medium' | 'low';
  covered: number;
}

/** What one training set gives: the engine's model and the baseline's eluent means. */
export interface Fold {
  knowledge: KnowledgeSet;
  model: ScoutModel;
  means: Map<string, number>;
}

export const foldOf = (knowledge: KnowledgeSet): Fold => ({
  knowledge,
  model: buildScoutModel(knowledge),
  means: eluentMeans(knowledge),
});

/** Predicts every measurement of a held-out compound from a training fold that does not contain it. */
export function scoreCompound(
  { knowledge, model, means }: Fold,
  compound: ScoutCompound,
  measurements: readonly ScoutMeasurement[],
): CompoundScore {
  if (knowledge.compounds.some((other) => other.id === compound.id || other.smiles === compound.smiles))
    throw new Error('The held-out compound is in the knowledge set.');
  const query = {
    id: null,
    smiles: compound.smiles,
    descriptors: compound.descriptors,
    classes: compound.classes,
    fingerprint: compound.fingerprint,
  };
  const score: CompoundScore = {
    compoundId: compound.id,
    errors: [],
    baselineErrors: [],
    hit: null,
    confidence: 'low',
    covered: 0,
  };
  for (const measurement of measurements) {
    if (measurement.rf === null) continue;
    const prediction = predictRf(model, query, measurement.phase, measurement.components);
    const mean = means.get(eluentKey(measurement.components));
    if (!prediction || mean === undefined) continue;
    score.errors.push(Math.abs(prediction.rf - measurement.rf));
    score.baselineErrors.push(Math.abs(mean - measurement.rf));
    if (measurement.rf >= prediction.interval[0] && measurement.rf <= prediction.interval[1]) score.covered += 1;
  }
  const result = scout(model, query, {
    targetRf: 0.3,
    solventPair: { weak: hexanes, strong: ethylAcetate },
    phase: measurements[0]?.phase,
  });
  score.confidence = result.confidence.level;
  if (result.suggestion) {
    const rf = measuredRfAt(measurements, result.suggestion.strongPercent / 100);
    score.hit = rf === null ? null : rf >= hitWindow[0] && rf <= hitWindow[1];
  }
  return score;
}

export interface Summary {
  mae: number;
  baselineMae: number;
  hit: number;
  hitCompounds: number;
  measurements: number;
  coverage: number;
  byConfidence: Record<string, { compounds: number; mae: number }>;
}

export function summarise(scores: readonly CompoundScore[]): Summary {
  const errors = scores.flatMap((score) => score.errors);
  const hits = scores.filter((score) => score.hit !== null);
  const byConfidence: Summary['byConfidence'] = {};
  for (const level of ['high', 'medium', 'low']) {
    const group = scores.filter((score) => score.confidence === level);
    const groupErrors = group.flatMap((score) => score.errors);
    byConfidence[level] = { compounds: group.length, mae: groupErrors.length ? average(groupErrors) : Number.NaN };
  }
  return {
    mae: average(errors),
    baselineMae: average(scores.flatMap((score) => score.baselineErrors)),
    hit: hits.filter((score) => score.hit).length / Math.max(hits.length, 1),
    hitCompounds: hits.length,
    measurements: errors.length,
    coverage: scores.reduce((sum, score) => sum + score.covered, 0) / Math.max(errors.length, 1),
    byConfidence,
  };
}
