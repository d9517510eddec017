import { cautionsFor } from '../../../../shared/catalogue/cautions';
import { scoutTargetRange, type ScoutResult } from '../../../../shared/schemas/scout';
import { rmToRf } from '../../../../shared/domain/rf';
import { additiveAdvice, closeSimilarity } from './additive-advice';
import { judgeConfidence } from './confidence';
import { adsorbentOf, orderPair, pairEpsilon, pairLabel } from './eluent-position';
import { suggestionEvidence } from './evidence';
import { ratioLabel } from './format';
import { ScoutModel, type ModelVariant } from './model';
import { listNeighbours, rankBySimilarity, type SimilarCompound } from './neighbours';
import { compoundsIn, predictInEluent, rfInterval, type EluentPrediction } from './pair-curve';
import { choosePhase } from './phase-choice';
import { contributions } from './prediction-weights';
import { curveAt } from './query-curve';
import { ladderSteps } from './ratio-ladder';
import { stainAdvice } from './stain-advice';
import { suggestBestPair, suggestRatio, type RatioSuggestion } from './suggest-ratio';
import type { KnowledgeSet, ScoutOptions, ScoutQuery } from './types';
import { failureWarnings } from './warnings';
import { firstPlate } from './first-plate';
import { ionisableGroups } from './ionisable';
import { voteForPair } from './pair-vote';

export type ScoutEngineResult = Omit<ScoutResult, 'query'>;

/** Options Scout cannot honour (a pair without ε°, a target out of range); the API answers 422. */
export class ScoutOptionError extends Error {}

/** The model of a knowledge set; build once per version and reuse it. */
export const buildScoutModel = (knowledge: KnowledgeSet) => new ScoutModel(knowledge);

/** 'full' when a recorded compound is close (Tanimoto on the substructure keys the kernel uses ≥ 0.5), otherwise descriptors only. */
function chooseVariant(ranked: readonly SimilarCompound[]): ModelVariant {
  const best = ranked.reduce((max, item) => Math.max(max, item.keys ?? item.similarity), 0);
  return best >= closeSimilarity ? 'full' : 'descriptors';
}

/** The query's predicted Rf in an eluent on a phase (for evaluation and checks); same model as `scout`. */
export function predictRf(
  model: ScoutModel,
  query: ScoutQuery,
  phase: string,
  components: readonly { solvent: string; parts: number }[],
): EluentPrediction | null {
  const adsorbent = adsorbentOf(phase);
  if (!adsorbent) return null;
  const variant = chooseVariant(rankBySimilarity(model, query));
  return predictInEluent(model, adsorbent, components, variant, model.queryKernel(query, variant));
}

function curvePoints(
  model: ScoutModel,
  suggestion: RatioSuggestion,
  adsorbent: NonNullable<ReturnType<typeof adsorbentOf>>,
) {
  return ladderSteps().map((step) => {
    const point = curveAt(suggestion.found.curve, pairEpsilon(suggestion.pair, step.strongFraction, adsorbent));
    const [lower, upper] = rfInterval(point.rm, point.sd, model.readingError);
    return { strongPercent: 100 * step.strongFraction, rf: rmToRf(point.rm), lower, upper };
  });
}

/**
 * Scout: starting conditions for a molecule from the recorded knowledge — neighbours, phase, pair and ratio for
 * the target Rf with the predicted Rf and its interval, additives, stains, confidence, failures and the evidence.
 */
export function scout(model: ScoutModel, query: ScoutQuery, options: ScoutOptions = {}): ScoutEngineResult {
  const targetRf = options.targetRf ?? 0.3;
  if (!(targetRf >= scoutTargetRange[0] && targetRf <= scoutTargetRange[1]))
    throw new ScoutOptionError(`The target Rf must lie between ${scoutTargetRange[0]} and ${scoutTargetRange[1]}.`);
  const k = options.k ?? 8;
  const ranked = rankBySimilarity(model, query);
  const close = ranked.slice(0, 2 * k).filter((item) => item.similarity >= closeSimilarity);
  const variant = chooseVariant(ranked);
  const phase = choosePhase(model, close, options.phase);
  const adsorbent = adsorbentOf(phase.key);
  const kernel = model.queryKernel(query, variant);
  const own = query.id !== null ? model.indexOf(query.id) : undefined;
  const groups = ionisableGroups(query);
  let suggestion: RatioSuggestion | null = null;
  let pairNote: string | null = null;
  let noSuggestion: string | null = null;
  if (!adsorbent)
    noSuggestion =
      `Scout's strength model (Snyder's ε°) covers silica and alumina only; for ${phase.name}, ` +
      `see the neighbours' conditions.`;
  else {
    if (options.solventPair) {
      const pair = orderPair(options.solventPair.weak, options.solventPair.strong, adsorbent);
      if (!pair)
        throw new ScoutOptionError(
          `No strength order is known for ${options.solventPair.weak} and ${options.solventPair.strong} ` +
            `on ${adsorbent} (ε° missing or equal).`,
        );
      suggestion = suggestRatio(model, adsorbent, pair, variant, kernel, targetRf);
    } else {
      const vote = voteForPair(model, ranked, adsorbent, own);
      if (vote.pair) suggestion = suggestRatio(model, adsorbent, vote.pair, variant, kernel, targetRf);
      if (suggestion) pairNote = vote.note;
      else suggestion = suggestBestPair(model, adsorbent, variant, kernel, targetRf);
    }
    if (!suggestion)
      noSuggestion = `No Rf has been recorded on ${adsorbent} yet; record a few plates and Scout will learn from them.`;
  }
  const weighted = suggestion
    ? contributions(model, suggestion.found.curve.data, variant, kernel, suggestion.point)
    : [];
  const shares = new Map(weighted.map((item) => [item.index, item.share]));
  const stains = stainAdvice(model, close, query.classes);
  const headline = firstPlate({
    model,
    query,
    ranked,
    suggestion,
    phase,
    options,
    targetRf,
    pairNote,
    suggestIn: (pair) => (adsorbent ? suggestRatio(model, adsorbent, pair, variant, kernel, targetRf) : null),
  });
  const basis = variant === 'full' ? 'neighbours-and-descriptors' : 'descriptors-only';
  let output: ScoutEngineResult['suggestion'] = null;
  let evidence: ScoutEngineResult['evidence'] = [];
  let confidence: ScoutEngineResult['confidence'] = { level: 'low', reasons: [noSuggestion ?? 'No suggestion.'] };
  if (suggestion && adsorbent) {
    const label = ratioLabel(suggestion.pair, suggestion.parts);
    const data = suggestion.found.curve.data;
    const closeInPair = ranked.filter((item) => item.similarity >= 0.7 && data.points.has(item.index)).length;
    confidence = judgeConfidence({
      suggestion,
      basis,
      best: ranked[0],
      closeInPair,
      compoundsInPair: suggestion.found.borrowedFrom ? 0 : compoundsIn(data),
    });
    evidence = suggestionEvidence(model, suggestion, adsorbent, targetRf, weighted, label.label, ranked);
    const pairOut = (pair: { weak: string; strong: string }) => ({ ...pair, label: pairLabel(pair) });
    output = {
      phase,
      pair: pairOut(suggestion.pair),
      parts: suggestion.parts,
      strongPercent: 100 * suggestion.strongFraction,
      notation: label.notation,
      label: label.label,
      epsilon: suggestion.epsilon,
      predictedRf: suggestion.rf,
      interval: suggestion.interval,
      reach: suggestion.reach,
      basis,
      borrowedFrom: suggestion.found.borrowedFrom ? pairOut(suggestion.found.borrowedFrom) : null,
      curve: curvePoints(model, suggestion, adsorbent),
      components: label.components,
    };
  }
  return {
    targetRf,
    knowledge: { compounds: model.compounds.length, measurements: model.knowledge.measurements.length },
    firstPlate: headline,
    suggestion: output,
    noSuggestion,
    neighbours: listNeighbours(model, ranked, k, shares),
    additives: additiveAdvice(model, close, query.classes).filter((item) => groups[item.purpose]),
    stains,
    confidence,
    warnings: failureWarnings(
      model,
      own === undefined || close.some((item) => item.index === own) ? close : [{ index: own, similarity: 1 }, ...close],
      groups,
    ),
    evidence,
    cautions: cautionsFor({
      solventKeys: (headline?.components ?? output?.components ?? []).map((part) => part.solvent),
      stainKeys: stains.map((item) => item.stain),
      flashColumn: true,
      handlesSilica: true,
    }),
  };
}
