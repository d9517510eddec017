import { stains, type Stain } from '../catalogue/stains';

export interface StainSuggestion {
  stain: Stain;
  /** Higher is a better first choice; only the order matters. */
  score: number;
  /** Compound classes of the molecule this stain shows. */
  matchedClasses: string[];
  reasons: string[];
  source: string;
}

const weights: Record<Stain['selectivity'], number> = { specific: 3, broad: 2, general: 1 };
const generalFallback = 0.5;
const tryFirstBonus = 2;

const readable = (classKey: string) => classKey.replace(/-/g, ' ');

/**
 * Stains likely to show a compound with these class keys (see compound-classes.ts), best first.
 * Each matching class adds 3 for a specific stain, 2 for a broad one, 1 for a general one, halved for a stain
 * that shows only some members of a class (UV 365: fluorescent ones); non-destructive UV gets a bonus when it matches
 * because it is looked at first; general stains stay listed as fallbacks.
 * What each stain shows: common practice (standard TLC stain tables), as each stain's `source` says.
 */
export function suggestStains(classKeys: readonly string[]): StainSuggestion[] {
  const classes = new Set(classKeys);
  const suggestions = stains.map((stain) => {
    const matchedClasses = stain.detects.filter((key) => classes.has(key));
    const reasons = matchedClasses.map((key) => `shows ${readable(key)}: ${stain.shows}`);
    let score = matchedClasses.length * weights[stain.selectivity] * (stain.hitRate === 'sometimes' ? 0.5 : 1);
    if (matchedClasses.length > 0 && stain.nonDestructive) {
      score += tryFirstBonus;
      reasons.push('non-destructive: look under UV before dipping in any stain');
    }
    if (stain.selectivity === 'general') {
      score += generalFallback;
      if (matchedClasses.length === 0) reasons.push(`general stain: ${stain.shows}`);
    }
    return { stain, score, matchedClasses, reasons, source: stain.source };
  });
  return suggestions
    .filter((suggestion) => suggestion.score > 0)
    .sort(
      (a, b) =>
        b.score - a.score ||
        Number(b.stain.nonDestructive) - Number(a.stain.nonDestructive) ||
        a.stain.name.localeCompare(b.stain.name),
    );
}
