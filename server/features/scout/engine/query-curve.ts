import { predictGp } from './gaussian-process';
import type { ModelVariant, ScoutModel } from './model';
import type { PairData } from './pair-data';

/** The query's predicted RM at one anchor, after the curve was made monotone. */
interface CurveAnchor {
  fraction: number;
  epsilon: number;
  rm: number;
  /** Standard deviation of a new measurement's RM, from the calibrated process. */
  sd: number;
  /** Position in `data.anchors` and in the model's fits. */
  anchor: number;
}

export interface QueryCurve {
  data: PairData;
  variant: ModelVariant;
  anchors: CurveAnchor[];
  /** dRM/dε° used beyond the outermost anchors (the pair's pooled slope). */
  slope: number;
}

export interface QueryKernel {
  values: Float64Array;
  self: number;
}

/** RM uncertainty added per unit ε° of extrapolation beyond the outermost anchor (a slope uncertainty of ±2). */
const extrapolationSd = 2;

/**
 * Pool-adjacent-violators: the weighted least-squares fit to the values that never rises with ε° (more strong
 * solvent never holds a spot back — Soczewiński's slope is negative; Barlow et al. 1972 for the algorithm).
 */
export function nonIncreasing(values: readonly number[], weights: readonly number[]): number[] {
  const blocks: { value: number; weight: number; size: number }[] = [];
  values.forEach((value, index) => {
    blocks.push({ value, weight: weights[index], size: 1 });
    while (blocks.length > 1 && blocks[blocks.length - 2].value < blocks[blocks.length - 1].value) {
      const last = blocks.pop()!;
      const previous = blocks.pop()!;
      const weight = previous.weight + last.weight;
      blocks.push({
        value: (previous.value * previous.weight + last.value * last.weight) / weight,
        weight,
        size: previous.size + last.size,
      });
    }
  });
  return blocks.flatMap((block) => Array<number>(block.size).fill(block.value));
}

/** The query's curve in a pair: the process's prediction at each anchor, made non-increasing in ε°. Null without anchors. */
export function queryCurve(
  model: ScoutModel,
  data: PairData,
  variant: ModelVariant,
  kernel: QueryKernel,
): QueryCurve | null {
  if (data.anchors.length === 0) return null;
  const fits = model.anchorFits(data, variant);
  const raw = fits.map((fit) =>
    predictGp(
      fit.gp,
      Float64Array.from(fit.gp.indices, (index) => kernel.values[index]),
      kernel.self,
    ),
  );
  const smoothed = nonIncreasing(
    raw.map((prediction) => prediction.mean),
    raw.map((prediction) => 1 / prediction.variance),
  );
  return {
    data,
    variant,
    slope: data.slope,
    anchors: data.anchors.map((anchor, index) => ({
      fraction: anchor.fraction,
      epsilon: anchor.epsilon,
      rm: smoothed[index],
      sd: Math.sqrt(raw[index].variance),
      anchor: index,
    })),
  };
}

export interface CurvePoint {
  rm: number;
  sd: number;
  /** Anchors the value was interpolated between, with their shares; one anchor when extrapolated. */
  from: { anchor: number; share: number }[];
  extrapolated: boolean;
}

/** RM and its sd at a strength: linear in ε° between anchors, the pooled slope beyond them. */
export function curveAt(curve: QueryCurve, epsilon: number): CurvePoint {
  const { anchors } = curve;
  const first = anchors[0];
  const last = anchors[anchors.length - 1];
  if (epsilon <= first.epsilon || epsilon >= last.epsilon) {
    const end = epsilon <= first.epsilon ? first : last;
    const distance = Math.abs(epsilon - end.epsilon);
    return {
      rm: end.rm + curve.slope * (epsilon - end.epsilon),
      sd: Math.hypot(end.sd, extrapolationSd * distance),
      from: [{ anchor: end.anchor, share: 1 }],
      extrapolated: distance > 1e-6,
    };
  }
  const upper = anchors.findIndex((anchor) => anchor.epsilon >= epsilon);
  const a = anchors[upper - 1];
  const b = anchors[upper];
  const t = (epsilon - a.epsilon) / (b.epsilon - a.epsilon);
  return {
    rm: a.rm + t * (b.rm - a.rm),
    sd: a.sd + t * (b.sd - a.sd),
    from: [
      { anchor: a.anchor, share: 1 - t },
      { anchor: b.anchor, share: t },
    ],
    extrapolated: false,
  };
}

/** The strength at which the curve reaches an RM (inverse of curveAt; the curve never rises with ε°). */
export function epsilonForRm(curve: QueryCurve, rm: number): number {
  const { anchors } = curve;
  const first = anchors[0];
  const last = anchors[anchors.length - 1];
  if (rm >= first.rm) return first.epsilon + (rm - first.rm) / curve.slope;
  if (rm <= last.rm) return last.epsilon + (rm - last.rm) / curve.slope;
  const index = anchors.findIndex((anchor) => anchor.rm <= rm);
  const a = anchors[index - 1];
  const b = anchors[index];
  if (a.rm === b.rm) return a.epsilon;
  return a.epsilon + ((rm - a.rm) / (b.rm - a.rm)) * (b.epsilon - a.epsilon);
}
