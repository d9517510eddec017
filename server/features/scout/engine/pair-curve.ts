import type { Adsorbent } from '../../../../shared/catalogue/types';
import { positionOf } from './eluent-position';
import type { ModelVariant, ScoutModel } from './model';
import type { PairData } from './pair-data';
import { curveAt, queryCurve, type QueryCurve, type QueryKernel } from './query-curve';
import { rmToRf } from '../../../../shared/domain/rf';
import type { SolventPair } from './types';

/** A query curve for a pair; `borrowedFrom` names the pair it was read from when nothing was recorded in this one. */
export interface PairCurve {
  pair: SolventPair;
  curve: QueryCurve;
  borrowedFrom: SolventPair | null;
}

/** How many compounds have a point in the pair. */
export const compoundsIn = (data: PairData) => data.points.size;

/**
 * The query's curve in a pair. With nothing recorded in the pair, the best-recorded pair on the adsorbent lends
 * its curve: both sit on Snyder's ε° scale, so equal ε° is read as equal retention (no selectivity offset known).
 */
export function pairCurve(
  model: ScoutModel,
  adsorbent: Adsorbent,
  pair: SolventPair,
  variant: ModelVariant,
  kernel: QueryKernel,
): PairCurve | null {
  const data = model.pairData(adsorbent, pair);
  const own = queryCurve(model, data, variant, kernel);
  if (own) return { pair: data.pair, curve: own, borrowedFrom: null };
  const lender = model
    .pairsOn(adsorbent)
    .filter((other) => other.anchors.length > 0)
    .sort((a, b) => compoundsIn(b) - compoundsIn(a))[0];
  if (!lender) return null;
  const curve = queryCurve(model, lender, variant, kernel);
  return curve ? { pair: data.pair, curve, borrowedFrom: lender.pair } : null;
}

export interface EluentPrediction {
  rf: number;
  /** 90 % interval of a new measurement's Rf. */
  interval: [number, number];
  rm: number;
  sd: number;
  epsilon: number;
  pair: SolventPair;
}

/** z of a two-sided 90 % normal interval. */
const z90 = 1.645;

/**
 * 90 % interval of a new plate's Rf: the RM interval rm ± 1.645·sd turned into Rf, each side at least
 * `readingError` wide, the 90 % half-width of reading one spot (ScoutModel.readingError). RM squeezes the error
 * near the origin and the front, while a spot read off a plate stays uncertain by a roughly constant Rf there; the
 * RM interval alone held only ~60 % of measurements below Rf 0.05 or above 0.9. (A floor, not a sum: in mid-range
 * the RM spread already contains the reading error. Chosen on leave-one-out over the fixed split's training part
 * only, `npm run eval:scout -- --tune`: coverage 0.903.)
 */
export function rfInterval(rm: number, sd: number, readingError = 0): [number, number] {
  const rf = rmToRf(rm);
  const lower = rf - Math.max(rf - rmToRf(rm + z90 * sd), readingError);
  const upper = rf + Math.max(rmToRf(rm - z90 * sd) - rf, readingError);
  return [Math.max(0, lower), Math.min(1, upper)];
}

/**
 * Predicted Rf of the query in an eluent given as parts by volume (a pure solvent or a pair): read off its curve
 * in that pair — for a pure solvent, the recorded pair containing it with most compounds. Null for mixtures of
 * three or more solvents or solvents without ε°.
 */
export function predictInEluent(
  model: ScoutModel,
  adsorbent: Adsorbent,
  components: readonly { solvent: string; parts: number }[],
  variant: ModelVariant,
  kernel: QueryKernel,
): EluentPrediction | null {
  const position = positionOf(components, adsorbent);
  if (!position) return null;
  let pair: SolventPair | null = position.kind === 'pair' ? position.pair : null;
  if (position.kind === 'pure') {
    const holders = model
      .pairsOn(adsorbent)
      .filter((data) => data.pair.weak === position.solvent || data.pair.strong === position.solvent);
    pair = holders.sort((a, b) => compoundsIn(b) - compoundsIn(a))[0]?.pair ?? null;
  }
  if (!pair) return null;
  const found = pairCurve(model, adsorbent, pair, variant, kernel);
  if (!found) return null;
  const point = curveAt(found.curve, position.epsilon);
  return {
    rf: rmToRf(point.rm),
    interval: rfInterval(point.rm, point.sd, model.readingError),
    rm: point.rm,
    sd: point.sd,
    epsilon: position.epsilon,
    pair: found.pair,
  };
}
