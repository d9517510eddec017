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

/** Widest 90 % interval (Rf) for each word: the word is read off the interval, never beside a wider one. */
const confidenceWidths = { high: 0.3, medium: 0.5 } as const;

/**
 * A plain-words confidence that follows the 90 % interval's width (issue 26, rule 6): high when the interval
 * spans at most 0.30 Rf, medium up to 0.50, low beyond — so "high" never stands beside a wide interval. Thin
 * evidence (descriptors only, a borrowed pair, fewer than 5 compounds in the pair, the target out of the pair's
 * reach) makes it low whatever the width, since an interval from next to nothing (or at Rf ≈ 0) says little.
 */
export function judgeConfidence(input: ConfidenceInput): Confidence {
  const { suggestion, basis, best, closeInPair, compoundsInPair } = input;
  const width = suggestion.interval[1] - suggestion.interval[0];
  const byWidth: Confidence['level'] =
    width <= confidenceWidths.high + 1e-9 ? 'high' : width <= confidenceWidths.medium + 1e-9 ? 'medium' : 'low';
  // Thin evidence caps the word (never raises it): an interval computed from next to nothing is not a reason to be sure.
  const thin =
    basis === 'descriptors-only' ||
    suggestion.found.borrowedFrom !== null ||
    compoundsInPair < 5 ||
    suggestion.reach !== 'within';
  const level: Confidence['level'] = thin ? 'low' : byWidth;
  const rule =
    byWidth === 'low'
      ? `wider than ${confidenceWidths.medium.toFixed(2)} Rf`
      : `at most ${confidenceWidths[byWidth].toFixed(2)} Rf wide`;
  const reasons = [
    `The 90 % interval spans ${two(width)} Rf (${two(suggestion.interval[0])}–${two(suggestion.interval[1])}); ` +
      `${byWidth} means ${rule}${thin && byWidth !== 'low' ? ', but the evidence below is thin, so low' : ''}.`,
  ];
  if (basis === 'descriptors-only')
    reasons.push(
      `No recorded compound is close (best similarity ${best ? two(best.similarity) : 'none'}): the estimate comes from descriptors alone.`,
    );
  else
    reasons.push(
      `Nearest recorded compound: similarity ${best ? two(best.similarity) : 'none'}; ${closeInPair} ` +
        `close neighbour${closeInPair === 1 ? '' : 's'} (≥ 0.7) recorded in this pair.`,
    );
  if (suggestion.found.borrowedFrom)
    reasons.push('Nothing was recorded in this pair; the ratio is translated from another pair at equal ε°.');
  if (compoundsInPair < 5)
    reasons.push(`Only ${compoundsInPair} compound${compoundsInPair === 1 ? '' : 's'} recorded in this pair.`);
  if (suggestion.reach !== 'within')
    reasons.push(
      suggestion.reach === 'too-polar'
        ? 'Even the pure strong solvent is predicted to leave the spot below the target.'
        : 'Even the weak solvent alone is predicted to move the spot past the target.',
    );
  if (suggestion.point.extrapolated) reasons.push('The ratio lies outside the compositions recorded in this pair.');
  return { level, reasons };
}
