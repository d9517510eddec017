/** One lane of a fractions plate: the fraction's number and the Rf of every spot in it. */
export type FractionLane = { fraction: number; rfs: number[] };
type FractionState = 'target' | 'mixed' | 'other' | 'empty';
export type PoolingReadout = {
  fractions: { fraction: number; state: FractionState }[];
  /** Runs of consecutive fractions holding the target alone: combine these. */
  pure: [number, number][];
  /** Runs holding the target with another spot. */
  mixed: [number, number][];
  /** "combine 5–9; 10–11 mixed" */
  summary: string;
};

/** Spots closer than this in Rf are one substance (common practice: about the reading error of a plate). */
const POOL_SAME_RF = 0.04;

function runs(numbers: number[]): [number, number][] {
  const sorted = [...numbers].sort((a, b) => a - b);
  const out: [number, number][] = [];
  for (const n of sorted) {
    const last = out[out.length - 1];
    if (last && n === last[1] + 1) last[1] = n;
    else out.push([n, n]);
  }
  return out;
}

const span = ([a, b]: [number, number]) => (a === b ? String(a) : `${a}–${b}`);

/**
 * Which fractions to pool: each fraction holds the target alone, the target with another spot (mixed), only
 * other spots, or nothing; consecutive target-only fractions are proposed for combining and mixed runs named
 * apart (common practice of flash chromatography: pool the clean fractions, set mixed ones aside or re-purify).
 */
export function proposePooling(lanes: FractionLane[], targetRf: number, tolerance = POOL_SAME_RF): PoolingReadout {
  const fractions = [...lanes]
    .sort((a, b) => a.fraction - b.fraction)
    .map((lane) => {
      const hasTarget = lane.rfs.some((rf) => Math.abs(rf - targetRf) <= tolerance);
      const hasOther = lane.rfs.some((rf) => Math.abs(rf - targetRf) > tolerance);
      const state: FractionState = hasTarget ? (hasOther ? 'mixed' : 'target') : hasOther ? 'other' : 'empty';
      return { fraction: lane.fraction, state };
    });
  const pure = runs(fractions.filter((f) => f.state === 'target').map((f) => f.fraction));
  const mixed = runs(fractions.filter((f) => f.state === 'mixed').map((f) => f.fraction));
  const parts = [
    ...(pure.length ? [`combine ${pure.map(span).join(', ')}`] : ['no fraction holds the target alone']),
    ...(mixed.length ? [`${mixed.map(span).join(', ')} mixed`] : []),
  ];
  return { fractions, pure, mixed, summary: parts.join('; ') };
}
