import type { Adsorbent } from '../../../../shared/catalogue/types';
import { adsorbentOf, pairLabel, positionOf } from './eluent-position';
import type { ScoutModel } from './model';
import type { SimilarCompound } from './neighbours';
import type { SolventPair } from './types';

/** Neighbours at least this similar vote with their clean records for the pair of the first plate. */
const pairVoteSimilarity = 0.7;

export interface PairVote {
  /** The pair most of the close neighbours' clean records used (similarity-weighted share ≥ 0.5), or null. */
  pair: SolventPair | null;
  note: string | null;
}

/**
 * Rule 1: when close neighbours (and the compound itself) were purified in one solvent pair, the first plate
 * uses that pair; the common-practice order (hexane/EtOAc first) is only the fallback. Each clean two-solvent
 * record on the adsorbent votes with its compound's similarity. A pair needs half the weight and two records;
 * a second pair with a quarter of the weight is named, so the chemist sees the other family the group used.
 */
export function voteForPair(
  model: ScoutModel,
  ranked: readonly SimilarCompound[],
  adsorbent: Adsorbent,
  own: number | undefined,
): PairVote {
  const votes = new Map<string, { pair: SolventPair; weight: number; records: number; compounds: Set<number> }>();
  let total = 0;
  for (const { index, similarity } of ranked
    .filter((item) => item.index === own || item.similarity >= pairVoteSimilarity)
    .slice(0, 16)) {
    for (const measurement of model.measurementsOf[index]) {
      if (measurement.outcome !== 'clean' || adsorbentOf(measurement.phase) !== adsorbent) continue;
      const position = positionOf(measurement.components, adsorbent);
      if (position?.kind !== 'pair') continue;
      const weight = index === own ? 1 : similarity;
      const vote = votes.get(position.key) ?? {
        pair: position.pair,
        weight: 0,
        records: 0,
        compounds: new Set<number>(),
      };
      vote.weight += weight;
      vote.records += 1;
      vote.compounds.add(index);
      votes.set(position.key, vote);
      total += weight;
    }
  }
  const [first, second] = [...votes.values()].sort((a, b) => b.weight - a.weight);
  if (!first || first.weight < 0.5 * total || first.records < 2) return { pair: null, note: null };
  const described = (vote: typeof first) =>
    `${vote.records} clean record${vote.records === 1 ? '' : 's'} of ${vote.compounds.size} close ` +
    `compound${vote.compounds.size === 1 ? '' : 's'}`;
  let note = `Pair: ${pairLabel(first.pair)}, as in ${described(first)} (similarity ≥ ${pairVoteSimilarity}).`;
  if (second && second.weight >= 0.25 * total)
    note += ` ${pairLabel(second.pair)} is the second family the group used (${described(second)}).`;
  return { pair: first.pair, note };
}
