import type { SimilarCompound } from './neighbours';
import type { RatioSuggestion } from './suggest-ratio';
import { two } from './format';

export interface Confidence {
  level: 'high' | 'medium' | 'low';
  reasons: string[];
}

export interface ConfidenceInput {
  suggestion: RatioSuggestion;
  basis: 'neighbours-and-descriptors' | 'descriptors-only';
  best: SimilarCompound | undefined;
  /** Close neighbours (similarity ≥ 0.7) with an Rf recorded in the suggestion's pair. */
  closeInPair: number;
  compoundsInPair: number;
}

/**
 * A plain-words confidence. Low: descriptors only, a borrowed pair, fewer than 5 compounds recorded in the pair,
 * the target out of the pair's reach, or a 90 % interval wider than 0.65 Rf. High: a near analogue (Tanimoto
 * ≥ 0.85), two or more close neighbours (≥ 0.7) recorded in the pair, an interval no wider than 0.55 Rf and no
 * extrapolation. Medium otherwise. Thresholds follow the leave-one-compound-out run on the open TLC data
 * (tests/bench/eval-scout.ts): Rf error averaged 0.08 with a neighbour ≥ 0.85, 0.10 at 0.5–0.7, 0.14 below 0.5.
 */
export function judgeConfidence(input: ConfidenceInput): Confidence {
  const { suggestion, basis, best, closeInPair, compoundsInPair } = input;
  const width = suggestion.interval[1] - suggestion.interval[0];
  const low: string[] = [];
  if (basis === 'descriptors-only') low.push(`No recorded compound is close (best similarity ${best ? two(best.similarity) : 'none'}): the estimate comes from descriptors alone.`);
  if (suggestion.found.borrowedFrom) low.push('Nothing was recorded in this pair; the ratio is translated from another pair at equal ε°.');
  if (compoundsInPair < 5) low.push(`Only ${compoundsInPair} compound${compoundsInPair === 1 ? '' : 's'} recorded in this pair.`);
  if (suggestion.reach !== 'within') low.push(suggestion.reach === 'too-polar' ? 'Even the pure strong solvent is predicted to leave the spot below the target.' : 'Even the weak solvent alone is predicted to move the spot past the target.');
  if (width > 0.65) low.push(`The 90 % interval is wide (${two(suggestion.interval[0])}–${two(suggestion.interval[1])}).`);
  if (low.length > 0) return { level: 'low', reasons: low };
  if (best && best.similarity >= 0.85 && closeInPair >= 2 && width <= 0.55 && !suggestion.point.extrapolated) {
    return { level: 'high', reasons: [`A near analogue (similarity ${two(best.similarity)}) and ${closeInPair} close neighbours (similarity ≥ 0.7) were run in this pair.`, `The 90 % interval spans ${two(width)} Rf.`] };
  }
  const reasons = [`Nearest recorded compound: similarity ${best ? two(best.similarity) : 'none'}; ${closeInPair} close neighbour${closeInPair === 1 ? '' : 's'} (≥ 0.7) recorded in this pair.`, `The 90 % interval spans ${two(width)} Rf.`];
  if (suggestion.point.extrapolated) reasons.push('The ratio lies outside the compositions recorded in this pair.');
  return { level: 'medium', reasons };
}
