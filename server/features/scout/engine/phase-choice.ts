import { stationaryPhaseByKey } from '../../../../shared/catalogue/stationary-phases';
import type { ScoutModel } from './model';
import type { SimilarCompound } from './neighbours';
import { adsorbentOf } from './eluent-position';

export interface PhaseChoice {
  key: string;
  name: string;
  why: string;
}

const defaultPhase = 'silica-gel';

/**
 * The stationary phase to suggest: the user's, else the phase of the close neighbours' clean records weighted by
 * similarity when a strength model exists for it, else silica gel — the usual flash phase (common practice).
 */
export function choosePhase(
  model: ScoutModel,
  close: readonly SimilarCompound[],
  requested: string | undefined,
): PhaseChoice {
  const named = (key: string, why: string) => ({ key, name: stationaryPhaseByKey(key)?.name ?? key, why });
  if (requested) return named(requested, 'the phase you chose');
  const votes = new Map<string, { weight: number; records: number }>();
  let total = 0;
  for (const { index, similarity } of close) {
    for (const measurement of model.measurementsOf[index]) {
      if (measurement.outcome !== 'clean' || !adsorbentOf(measurement.phase)) continue;
      const family = adsorbentOf(measurement.phase) === 'silica' ? defaultPhase : measurement.phase;
      const vote = votes.get(family) ?? { weight: 0, records: 0 };
      vote.weight += similarity;
      vote.records += 1;
      votes.set(family, vote);
      total += 1;
    }
  }
  const [best] = [...votes].sort((a, b) => b[1].weight - a[1].weight);
  if (!best)
    return named(
      defaultPhase,
      'no close neighbour has a clean record; silica gel is the usual flash phase (common practice)',
    );
  return named(best[0], `${best[1].records} of ${total} clean records of close neighbours used it`);
}
