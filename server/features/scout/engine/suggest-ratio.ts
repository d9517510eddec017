import type { Adsorbent } from '../../../../shared/catalogue/types';
import { rfToRm, rmToRf } from '../../../../shared/domain/rf';
import { fractionForEpsilon, pairEpsilon, solventEpsilon } from './eluent-position';
import type { ModelVariant, ScoutModel } from './model';
import { compoundsIn, pairCurve, rfInterval, type PairCurve } from './pair-curve';
import { curveAt, epsilonForRm, type CurvePoint, type QueryKernel } from './query-curve';
import { ladderSteps } from './ratio-ladder';
import type { SolventPair } from './types';

type Reach = 'within' | 'too-polar' | 'too-fast';

export interface RatioSuggestion {
  pair: SolventPair;
  found: PairCurve;
  /** Strong : weak parts of the rounded ratio. */
  parts: [number, number];
  strongFraction: number;
  /** The fraction the curve gives for the target before rounding to a written ratio. */
  exactStrongFraction: number;
  epsilon: number;
  point: CurvePoint;
  rf: number;
  interval: [number, number];
  /** 'too-polar': even the pure strong solvent leaves the spot below the target; 'too-fast': even the weak one moves it past. */
  reach: Reach;
}

/**
 * The written ratio in a pair whose predicted RM comes closest to the target's RM = log10((1 − Rf)/Rf): the
 * curve is solved for the target's ε° (Snyder), turned into a volume fraction, then rounded to the ratio ladder.
 */
export function suggestRatio(
  model: ScoutModel,
  adsorbent: Adsorbent,
  pair: SolventPair,
  variant: ModelVariant,
  kernel: QueryKernel,
  targetRf: number,
): RatioSuggestion | null {
  const found = pairCurve(model, adsorbent, pair, variant, kernel);
  if (!found) return null;
  const weakEpsilon = solventEpsilon(found.pair.weak, adsorbent) as number;
  const strongEpsilon = solventEpsilon(found.pair.strong, adsorbent) as number;
  const targetRm = rfToRm(targetRf);
  const wanted = epsilonForRm(found.curve, targetRm);
  const reach: Reach =
    wanted > strongEpsilon + 1e-9 ? 'too-polar' : wanted < weakEpsilon - 1e-9 ? 'too-fast' : 'within';
  const exactStrongFraction =
    reach === 'too-polar' ? 1 : reach === 'too-fast' ? 0 : fractionForEpsilon(found.pair, wanted, adsorbent);
  const rmAt = (fraction: number) => curveAt(found.curve, pairEpsilon(found.pair, fraction, adsorbent)).rm;
  const best = ladderSteps().reduce((chosen, step) =>
    Math.abs(rmAt(step.strongFraction) - targetRm) < Math.abs(rmAt(chosen.strongFraction) - targetRm) ? step : chosen,
  );
  const epsilon = pairEpsilon(found.pair, best.strongFraction, adsorbent);
  const point = curveAt(found.curve, epsilon);
  return {
    pair: found.pair,
    found,
    parts: best.parts,
    strongFraction: best.strongFraction,
    exactStrongFraction,
    epsilon,
    point,
    rf: rmToRf(point.rm),
    interval: rfInterval(point.rm, point.sd, model.readingError),
    reach,
  };
}

const alkanes = new Set(['hexanes', 'heptane', 'pentane', 'petroleum-ether', 'cyclohexane']);

/**
 * Order in which pairs are offered when the user names none (common practice): an alkane with EtOAc first, then
 * other alkane pairs, then DCM/MeOH, then the rest; within a tier, the pair with most recorded compounds.
 */
function tier(pair: SolventPair): number {
  if (alkanes.has(pair.weak) && pair.strong === 'ethyl-acetate') return 0;
  if (alkanes.has(pair.weak)) return 1;
  if (pair.weak === 'dichloromethane' && pair.strong === 'methanol') return 2;
  return 3;
}

/** RM units one tier of the common-practice order is worth against the prediction's standard deviation. */
const TIER_COST_RM = 0.15;

/**
 * Among pairs whose predicted curve reaches the target, the one with the best balance of common-practice order
 * (tier) and certainty (the predicted RM's sd): a familiar pair wins unless another one is much better evidenced,
 * e.g. when the nearest neighbours were all recorded in DCM/MeOH. When none reaches, the one closest to the target.
 */
export function suggestBestPair(
  model: ScoutModel,
  adsorbent: Adsorbent,
  variant: ModelVariant,
  kernel: QueryKernel,
  targetRf: number,
): RatioSuggestion | null {
  const candidates = model
    .pairsOn(adsorbent)
    .filter((data) => data.anchors.length > 0)
    .sort((a, b) => tier(a.pair) - tier(b.pair) || compoundsIn(b) - compoundsIn(a))
    .map((data) => suggestRatio(model, adsorbent, data.pair, variant, kernel, targetRf))
    .filter((suggestion): suggestion is RatioSuggestion => suggestion !== null);
  const cost = (suggestion: RatioSuggestion) => suggestion.point.sd + TIER_COST_RM * tier(suggestion.pair);
  const within = candidates.filter((suggestion) => suggestion.reach === 'within');
  if (within.length > 0) return within.reduce((best, next) => (cost(next) < cost(best) ? next : best));
  const targetRm = rfToRm(targetRf);
  return candidates.sort((a, b) => Math.abs(a.point.rm - targetRm) - Math.abs(b.point.rm - targetRm))[0] ?? null;
}
