import { rmToRf } from '../../../../shared/domain/rf';
import { smootherWeights } from './gaussian-process';
import type { ModelVariant, ScoutModel } from './model';
import type { PairData } from './pair-data';
import type { CurvePoint, QueryKernel } from './query-curve';
import type { TrainingSource } from './anchor-training';

export interface WeightedContribution {
  index: number;
  /** Share of Σ|weight| over all training compounds, 0–1. */
  share: number;
  /** The value the compound brought, as Rf, and whether it was measured there or read off a line. */
  rf: number;
  source: TrainingSource;
}

/**
 * Which recorded compounds the predicted value rests on: the process's equivalent-kernel weights A⁻¹·k at the
 * anchors the point was read from (Rasmussen & Williams 2006, §2.6), mixed by the interpolation shares.
 */
export function contributions(
  model: ScoutModel,
  data: PairData,
  variant: ModelVariant,
  kernel: QueryKernel,
  point: CurvePoint,
): WeightedContribution[] {
  const fits = model.anchorFits(data, variant);
  const total = new Map<number, { weight: number; rf: number; source: TrainingSource }>();
  for (const { anchor, share } of point.from) {
    const { gp, training } = fits[anchor];
    const weights = smootherWeights(
      gp,
      Float64Array.from(gp.indices, (index) => kernel.values[index]),
    );
    gp.indices.forEach((index, position) => {
      const entry = total.get(index) ?? {
        weight: 0,
        rf: rmToRf(training.y[position]),
        source: training.sources[position],
      };
      entry.weight += share * weights[position];
      total.set(index, entry);
    });
  }
  const sum = [...total.values()].reduce((acc, item) => acc + Math.abs(item.weight), 0) || 1;
  return [...total]
    .map(([index, item]) => ({ index, share: Math.abs(item.weight) / sum, rf: item.rf, source: item.source }))
    .sort((a, b) => b.share - a.share);
}
