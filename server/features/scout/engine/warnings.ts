import type { ScoutModel } from './model';
import type { SimilarCompound } from './neighbours';
import { measurementNotation, two } from './format';
import { groupsQueryLacks, ionisableGroups, type IonisableGroups } from './ionisable';

export interface ScoutWarning {
  recordId: number | null;
  compoundId: number;
  compoundName: string | null;
  similarity: number;
  outcome: 'partial' | 'failed';
  notation: string;
  message: string;
  demo: boolean;
}

/**
 * Failed and partial attempts of close neighbours, most similar first: failures are knowledge too. A neighbour
 * with an acid or a basic nitrogen the query lacks is left out: its failures (tailing acids, streaking amines)
 * came from a group the query does not have.
 */
export function failureWarnings(
  model: ScoutModel,
  close: readonly SimilarCompound[],
  groups: IonisableGroups,
): ScoutWarning[] {
  return close.flatMap(({ index, similarity }) => {
    const compound = model.compounds[index];
    if (similarity < 1 && groupsQueryLacks(groups, ionisableGroups(compound)).length > 0) return [];
    return model.measurementsOf[index]
      .filter((measurement) => measurement.outcome !== 'clean')
      .map((measurement) => {
        const notation = measurementNotation(measurement);
        const who = compound.name ?? compound.smiles;
        const verdict = measurement.outcome === 'failed' ? 'Failed' : 'Only partly separated';
        return {
          recordId: measurement.recordId,
          demo: measurement.demo === true,
          compoundId: compound.id,
          compoundName: compound.name,
          similarity,
          outcome: measurement.outcome as 'partial' | 'failed',
          notation,
          message:
            `${verdict} for ${who} (similarity ${two(similarity)}) in ` +
            `${notation}${measurement.outcomeReason ? `: ${measurement.outcomeReason}` : '.'}`,
        };
      });
  });
}
