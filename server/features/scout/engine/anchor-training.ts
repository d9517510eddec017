import { distanceToSpan, lineAt } from './curves';
import { measuredAt, type Anchor, type PairData } from './pair-data';

/**
 * How much a value read off a compound's own line (rather than measured at the anchor) counts, and how much one
 * carried over from another solvent pair counts; both fade with the ε° distance from where the compound was
 * measured (scale 0.15). Chosen with the kernel weights (see kernel.ts).
 */
const imputedWeight = 0.2;
const crossPairWeight = 0.1;
const fadeScale = 0.15;
/** Largest training set per anchor; measured values first, then by weight (bounds the O(n³) fit). */
const maxTraining = 600;

export type TrainingSource = 'measured' | 'own-line' | 'other-pair';

export interface AnchorTraining {
  indices: Int32Array;
  y: Float64Array;
  weights: Float64Array;
  sources: TrainingSource[];
  /** For other-pair values: the pair the compound was measured in. */
  via: (string | null)[];
}

/**
 * Mean difference, at the anchor's ε°, between compounds' lines in this pair and in another (selectivity offset
 * of the pairs at equal strength); 0 when no compound was run in both, i.e. Snyder's equal-strength assumption.
 */
function pairOffset(target: PairData, other: PairData, epsilon: number): number {
  let sum = 0;
  let count = 0;
  for (const [compound, line] of target.lines) {
    const otherLine = other.lines.get(compound);
    if (!otherLine) continue;
    sum += lineAt(line, epsilon) - lineAt(otherLine, epsilon);
    count += 1;
  }
  return count > 0 ? sum / count : 0;
}

/** Training values of every compound at one anchor: measured there, read off its own line, or carried over. */
export function anchorTraining(
  data: PairData,
  anchor: Anchor,
  others: readonly PairData[],
  compoundCount: number,
): AnchorTraining {
  const rows: { index: number; y: number; weight: number; source: TrainingSource; via: string | null }[] = [];
  const offsets = new Map<string, number>();
  for (let compound = 0; compound < compoundCount; compound++) {
    const measured = measuredAt(data, compound, anchor);
    if (measured !== null) {
      rows.push({ index: compound, y: measured, weight: 1, source: 'measured', via: null });
      continue;
    }
    const line = data.lines.get(compound);
    if (line) {
      rows.push({
        index: compound,
        y: lineAt(line, anchor.epsilon),
        weight: imputedWeight * Math.exp(-distanceToSpan(line, anchor.epsilon) / fadeScale),
        source: 'own-line',
        via: null,
      });
      continue;
    }
    const best = others
      .filter((other) => other.lines.has(compound))
      .sort((a, b) => (b.lines.get(compound)?.points ?? 0) - (a.lines.get(compound)?.points ?? 0))[0];
    if (!best) continue;
    if (!offsets.has(best.key)) offsets.set(best.key, pairOffset(data, best, anchor.epsilon));
    const otherLine = best.lines.get(compound)!;
    rows.push({
      index: compound,
      y: lineAt(otherLine, anchor.epsilon) + (offsets.get(best.key) ?? 0),
      weight: crossPairWeight * Math.exp(-distanceToSpan(otherLine, anchor.epsilon) / fadeScale),
      source: 'other-pair',
      via: best.key,
    });
  }
  const kept = rows
    .sort((a, b) => Number(b.source === 'measured') - Number(a.source === 'measured') || b.weight - a.weight)
    .slice(0, maxTraining);
  return {
    indices: Int32Array.from(kept, (row) => row.index),
    y: Float64Array.from(kept, (row) => row.y),
    weights: Float64Array.from(kept, (row) => Math.max(row.weight, 1e-3)),
    sources: kept.map((row) => row.source),
    via: kept.map((row) => row.via),
  };
}
